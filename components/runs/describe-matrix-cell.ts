import type { Href } from 'expo-router';
import type { DiagnosisKind } from '../../shared/diagnosis';
import { diagnosisClass } from '../../shared/diagnosis-class';
import { DIAGNOSIS_CLASSES } from '../../shared/diagnosis-classes';
import { DIAGNOSIS_KIND_NAMES } from '../../shared/diagnosis-kind-names';
import { DIAGNOSIS_KINDS } from '../../shared/diagnosis-kinds';
import { plural } from '../../shared/plural';
import type { RunMatrixCell } from '../../shared/run-matrix-cell';
import { targetPageHref } from '../libraries/target-page-href';
import { failuresHref } from './failures-href';
import { checkStoppedByError } from '../../shared/check-stopped-by-error';
import { judgedPoints } from '../../shared/judged-points';
import { OUTCOME_GLYPH } from './outcome-glyph';
import type { Tone } from './outcome-tone';
import { waitingForWorkerWords } from './waiting-for-worker-words';

export interface MatrixCellWords {
  tone: Tone;
  /** The first line, glyph first: "✓ 120", "❌ 42 · 2 branch · 40 accuracy", "◊ error". */
  headline: string;
  /** Further lines: other diagnoses, passes beside failures, skips, "nothing was checked", the first error, the worker. */
  details: string[];
  /** Everything above as one sentence for a screen reader. */
  label: string;
  /**
   * Where the cell leads: the failure table filtered to the pair when it has rows there (failing
   * or errored points; skipped points are counted, never stored as rows), else the page that
   * explains why nothing was checked (the target's functions, when it lacks one); null otherwise.
   */
  link: CellLink | null;
}

export interface CellLink {
  href: Href;
  /** What the cell shows: "failures →". */
  words: string;
  /** What a screen reader hears after the cell's label. */
  said: string;
}

const n = (x: number) => x.toLocaleString('en-GB');

/** The checks beyond the points that failed, in words: "1 property law failed", "2 monodromy checks failed". */
const beyondPointsWords = (cell: Pick<RunMatrixCell, 'lawsFailed' | 'loopsFailed'>): string[] => [
  ...(cell.lawsFailed > 0 ? [`${plural(cell.lawsFailed, 'property law')} failed`] : []),
  ...(cell.loopsFailed.length > 0 ? [`${plural(cell.loopsFailed.length, 'monodromy check')} failed`] : []),
];

/**
 * A matrix cell in words and glyphs, so it reads without its colour: the outcome and its counts,
 * the failures by class (branch first) and by diagnosis (branch labels first, then the largest),
 * points not applicable to the target's entry, and for an error whether anything was checked at all.
 */
export function describeMatrixCell(cell: RunMatrixCell, runId: string): MatrixCellWords {
  const pair = `${cell.suite} on ${cell.target}`;
  if (cell.status === 'queued' && cell.noWorkerHasTarget) {
    const why = waitingForWorkerWords([cell.target]);
    return {
      tone: 'live',
      headline: '… waiting for a worker',
      details: [why],
      label: `${pair}: ${why}`,
      link: null,
    };
  }
  if (cell.status === 'queued' || cell.status === 'running') {
    const word = cell.status === 'queued' ? 'waiting its turn' : 'running now';
    // A queued pair that has a worker was taken before by one that died: it is queued again.
    const who = cell.worker
      ? [cell.status === 'queued' ? `started before on ${cell.worker}, which stopped` : `on ${cell.worker}`]
      : [];
    return {
      tone: 'live',
      headline: `${cell.status === 'queued' ? '…' : '↻'} ${word}`,
      details: who,
      label: [`${pair}: ${word}`, ...who].join(', '),
      link: null,
    };
  }
  const counts = cell.counts ?? { pass: 0, fail: 0, error: 0, skipped: 0, notApplicable: 0 };
  const judged = judgedPoints(cell);
  const hasRows = counts.fail + counts.error > 0;
  const reasons = cell.skipReasons;
  // The harness's generic note ("nothing was checked: every point was skipped …") says less than the reasons.
  const genericNote = (e: string) => e.toLowerCase().startsWith('nothing was checked');
  const errors = reasons.length > 0 ? cell.errors.filter((e) => !genericNote(e)) : cell.errors;
  if (cell.status === 'cancelled' && !cell.counts) {
    return {
      tone: 'neutral',
      headline: '× cancelled',
      details: ['nothing was checked'],
      label: `${pair}: cancelled before it ran, nothing was checked`,
      link: null,
    };
  }
  // Branch labels first, then by count: 40 inaccurate points must not push 2 zero-sign ones out of sight.
  const rank = (kind: DiagnosisKind) => DIAGNOSIS_CLASSES.indexOf(diagnosisClass(kind));
  const diagnoses = DIAGNOSIS_KINDS.map((kind) => [kind, cell.byDiagnosis?.[kind] ?? 0] as [DiagnosisKind, number])
    .filter(([, count]) => count > 0)
    .sort((a, b) => rank(a[0]) - rank(b[0]) || b[1] - a[1]);
  const classes = DIAGNOSIS_CLASSES.map((c) => [c, cell.byClass?.[c] ?? 0] as const).filter(([, count]) => count > 0);
  const details: string[] = [];
  const said: string[] = [];
  const beyond = beyondPointsWords(cell);
  let headline: string;
  let tone: Tone;
  if (checkStoppedByError(cell)) {
    tone = 'error';
    headline =
      counts.error > 0
        ? `${OUTCOME_GLYPH.error} ${n(counts.error)} error${counts.error === 1 ? '' : 's'}`
        : `${OUTCOME_GLYPH.error} error`;
    said.push(counts.error > 0 ? `${n(counts.error)} points in error` : 'error');
    if (judged === 0) {
      if (!errors[0] || !genericNote(errors[0])) details.push('nothing was checked');
      said.push('nothing was checked');
    } else {
      details.push(
        `${OUTCOME_GLYPH.pass} ${n(counts.pass)} passed${counts.fail ? ` · ${OUTCOME_GLYPH.fail} ${n(counts.fail)} failed` : ''}`,
      );
      said.push(`${n(counts.pass)} passed`, ...(counts.fail ? [`${n(counts.fail)} failed`] : []));
    }
  } else if (counts.fail > 0) {
    tone = 'fail';
    if (classes.length > 0) {
      headline = `${OUTCOME_GLYPH.fail} ${n(counts.fail)}${classes.map(([c, count]) => ` · ${n(count)} ${c}`).join('')}`;
      said.push(
        `${n(counts.fail)} failed: ${classes.map(([c, count]) => `${n(count)} ${c} finding${count === 1 ? '' : 's'}`).join(', ')}`,
        ...diagnoses.map(([kind, count]) => `${n(count)} ${DIAGNOSIS_KIND_NAMES[kind].name}`),
      );
      for (const [kind, count] of diagnoses) details.push(`${n(count)} ${DIAGNOSIS_KIND_NAMES[kind].name}`);
    } else {
      // A cell stored before failures were counted by class: the leading diagnosis stands in.
      const [top, ...rest] = diagnoses;
      headline = `${OUTCOME_GLYPH.fail} ${n(counts.fail)}${top ? ` · ${n(top[1])} ${top[0]}` : ''}`;
      said.push(
        `${n(counts.fail)} failed`,
        ...diagnoses.map(([kind, count]) => `${n(count)} ${DIAGNOSIS_KIND_NAMES[kind].name}`),
      );
      for (const [kind, count] of rest) details.push(`${n(count)} ${DIAGNOSIS_KIND_NAMES[kind].name}`);
    }
    details.push(`${OUTCOME_GLYPH.pass} ${n(counts.pass)} passed`);
    said.push(`${n(counts.pass)} passed`);
    if (counts.error > 0) {
      details.push(`${OUTCOME_GLYPH.error} ${n(counts.error)} error`);
      said.push(`${n(counts.error)} in error`);
    }
  } else if (beyond.length > 0) {
    // Every point passed, but a law or a monodromy check did not: the pair failed, and says on what.
    tone = 'fail';
    headline = `${OUTCOME_GLYPH.fail} ${beyond.join(' · ')}`;
    details.push(`${OUTCOME_GLYPH.pass} ${n(counts.pass)} points passed`);
    said.push(...beyond, `${n(counts.pass)} points passed`);
  } else {
    tone = cell.status === 'cancelled' ? 'neutral' : 'pass';
    headline = `${OUTCOME_GLYPH.pass} ${n(counts.pass)}`;
    said.push(`${n(counts.pass)} passed, none failed`);
    if (cell.status === 'cancelled') {
      details.push('× cancelled part way');
      said.push('cancelled part way');
    }
  }
  if (counts.fail > 0 && beyond.length > 0 && !checkStoppedByError(cell)) {
    details.push(...beyond);
    said.push(...beyond);
  }
  for (const path of cell.loopsFailed) {
    details.push(`monodromy around “${path}” failed`);
    said.push(`the monodromy check around ${path} failed`);
  }
  if (reasons.length > 0) {
    // Why, not only how many: "complex.js@2.4.3 has no acsch: 40 skipped".
    for (const r of reasons) {
      details.push(`${OUTCOME_GLYPH.skipped} ${n(r.count)} skipped: ${r.reason}`);
      said.push(`${n(r.count)} skipped because ${r.reason}`);
    }
  } else if (counts.skipped > 0) {
    details.push(`${OUTCOME_GLYPH.skipped} ${n(counts.skipped)} skipped`);
    said.push(`${n(counts.skipped)} skipped`);
  }
  if (counts.notApplicable > 0) {
    details.push(`${OUTCOME_GLYPH.notApplicable} ${n(counts.notApplicable)} not applicable`);
    said.push(`${n(counts.notApplicable)} not applicable to the entry`);
  }
  const firstError = errors[0];
  if (firstError) details.push(firstError);
  if (cell.worker) {
    details.push(`ran on ${cell.worker}`);
    said.push(`ran on ${cell.worker}`);
  }
  const lacks = [...new Set(reasons.flatMap((r) => r.lacks ?? []))];
  const link: CellLink | null = hasRows
    ? { href: failuresHref(runId, cell.suite, cell.target), words: 'failures →', said: 'Open these failures' }
    : lacks.length > 0
      ? {
          href: targetPageHref(cell.target),
          words: `what ${cell.target} has →`,
          said: `Open the functions ${cell.target} has (it has no ${lacks.join(', ')})`,
        }
      : null;
  return {
    tone,
    headline,
    details,
    label: `${pair}: ${said.join(', ')}${firstError ? `. ${firstError}` : ''}`,
    link,
  };
}
