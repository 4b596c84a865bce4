import { describeLabel } from '../../shared/describe-label';
import type { DiagnosisKind } from '../../shared/diagnosis';
import type { DiagnosisClass } from '../../shared/diagnosis-class';
import { DIAGNOSIS_CLASSES } from '../../shared/diagnosis-classes';
import type { ClassCounts } from '../../shared/run-result';
import type { WireComplex } from '../../shared/wire-complex';
import type { NewMail } from '../mail/new-mail';
import type { RegressionRow } from './regression-row';
import { formatComplexText } from '../../shared/format-complex-text';
import { REGRESSION_MAIL_ROWS } from './regression-mail-rows';
import { escapeHtml as escape } from '../mail/escape-html';
import { regressionSummary } from './regression-summary';
import { plural } from '../../shared/plural';
import { STOPPED_BY_ERROR } from '../../shared/stopped-by-error';
import type { StoppedCheck } from './newly-stopped-checks';

const c = (v: WireComplex | null) => formatComplexText(v);
/** Every label of a row in words, the leading one first; "error" for a row without one. */
const labelsOf = (r: RegressionRow): string[] => {
  const labels = r.labels.length > 0 ? r.labels : r.diagnosis ? [r.diagnosis] : [];
  return labels.length > 0 ? labels.map((l) => describeLabel(l, 'long')) : ['error'];
};
const choiceOf = (choice: string) => `${choice} (a convention choice: libraries may differ here and still be right)`;
/** A composed subject's steps, one line each, the first that left the reference marked. */
const stepLines = (r: RegressionRow): string[] =>
  (r.steps ?? []).map(
    (s, i) =>
      `${i + 1}. ${s.text}: library ${c(s.library)}, reference ${c(s.reference)}${i === r.firstLeftStep ? '  ← first step that left the reference' : ''}`,
  );
const HEADING: Record<DiagnosisClass, string> = {
  branch:
    'Branch regressions: wrong sheet, side of a cut or zero sign, a misplaced jump, a value not finite, or a disagreement',
  accuracy:
    'Accuracy regressions: right sheet and side of every cut, further from the exact value than the tolerance allows',
};

/**
 * The regression mail of a run. It opens with the regressions counted by class, says plainly
 * when they are accuracy only, then a summary (regression-summary.ts: counts by kind, branch
 * kinds first, each linked to the failure table; the targets most affected; a link to all of
 * them) before any table. Then it lists branch regressions first, under a heading per class (an
 * acosh value 12 ulps off used to come before the real sign flips), grouped per suite × target,
 * the groups with the most regressions first (31 groups in alphabetical order hid the large
 * ones): one block per regression with
 * input bits, expected and actual values, every label, a convention choice, a composed subject's
 * steps with the first that left the reference, the rule, a reproducer and a link to the case;
 * plain text and HTML with the same content. It says what a regression is and that it covers only what was checked.
 * Checks that judged points in the previous run and were stopped by an error in this one are listed
 * after the summary, each with its reason; a run with such checks and no regression gets this mail too,
 * its subject and lead saying so (a library that lost a function regresses no point and was silent).
 * In HTML each regression is a block of label–value rows, two columns wide, so the mail reads on
 * a phone without scrolling sideways (eight columns side by side did not).
 */
export function regressionMail(input: {
  recipients: string[];
  planName: string;
  runId: string;
  appUrl: string;
  /** The regressions to list, branch ones first (mark-regressions.ts reads them in that order). */
  rows: RegressionRow[];
  total: number;
  /** Every regression of the run by class, listed or not. */
  byClass: ClassCounts;
  /** Every regression of the run under each of its label kinds, listed or not. */
  byKind: Partial<Record<DiagnosisKind, number>>;
  /** Targets by number of regressions, most first. */
  targets: { name: string; count: number }[];
  versionChanges: { key: string; from: string; to: string }[];
  /** Checks judged in the previous completed run and stopped by an error in this one (newly-stopped-checks.ts). */
  stopped?: StoppedCheck[];
  /** Keeps the same regressions from being mailed twice (mark-regressions.ts). */
  idempotencyKey?: string;
}): NewMail {
  const { total, byClass } = input;
  const stopped = input.stopped ?? [];
  const link = (id: string) => `${input.appUrl}/failures/${id}`;
  const runLink = `${input.appUrl}/runs/${input.runId}`;
  const accuracyOnly = byClass.branch === 0 && byClass.accuracy > 0;
  const stoppedWords = `${plural(stopped.length, 'check')} ${STOPPED_BY_ERROR}`;
  const subject =
    total > 0
      ? `[Sheetkeeper] ${plural(total, 'regression')} in ${input.planName}: ${
          accuracyOnly ? 'accuracy only' : `${byClass.branch} branch, ${byClass.accuracy} accuracy`
        }${stopped.length > 0 ? `; ${stoppedWords}` : ''}`
      : `[Sheetkeeper] ${stoppedWords} in ${input.planName}: checked last time, nothing judged now`;
  const lead =
    total > 0
      ? `${plural(total, 'point')} passed in the previous completed run of "${input.planName}" and ${total === 1 ? 'fails' : 'fail'} now: ${plural(byClass.branch, 'branch finding')} and ${plural(byClass.accuracy, 'accuracy finding')}.`
      : `No point that passed in the previous completed run of "${input.planName}" fails now, but ${stoppedWords} that judged points then: this run checked nothing of ${stopped.length === 1 ? 'it' : 'them'}, so ${stopped.length === 1 ? 'it' : 'they'} could not regress either.`;
  const stoppedHeading = `Checks that ran last time and were ${STOPPED_BY_ERROR} now (${stopped.length})`;
  const stoppedLines = stopped.map((c) => `${c.suite} × ${c.target}: ${c.reason}`);
  const classLine = accuracyOnly
    ? `These regressions are accuracy only: every value is on the expected branch with the expected zero signs, and only further from the exact value than the tolerance allows.`
    : byClass.branch > 0
      ? `Branch findings are listed first: a value on another sheet, on the wrong side of a cut, with the wrong zero sign, jumping where it should not, not finite, or disagreeing with another way of computing it.`
      : '';
  const changes = input.versionChanges.map((v) => `${v.key}: ${v.from} → ${v.to}`);
  const changesLine = changes.length
    ? `Version changes since then: ${changes.join('; ')}.`
    : 'No library version changed since then.';
  const scope =
    'A regression is judged only at the points, paths and conventions the suites check; points outside them were not looked at.';
  const shown = [...input.rows.slice(0, REGRESSION_MAIL_ROWS)].sort(
    (a, b) => rankOf(a.findingClass) - rankOf(b.findingClass),
  );
  const summary = regressionSummary({
    runId: input.runId,
    appUrl: input.appUrl,
    total,
    byClass,
    byKind: input.byKind,
    targets: input.targets,
  });
  const groups = [...DIAGNOSIS_CLASSES, null]
    .map((k) => ({ k, pairs: pairsOf(shown.filter((r) => r.findingClass === k)) }))
    .filter((g) => g.pairs.length > 0);
  const more = total - shown.length;
  const text = [
    lead,
    ...(classLine ? [classLine] : []),
    '',
    ...(total > 0 ? summary.text : []),
    ...(stopped.length > 0 ? [stoppedHeading, ...stoppedLines.map((l) => `  ${l}`), `  the run: ${runLink}`, ''] : []),
    changesLine,
    '',
    ...groups.flatMap((g) => [
      ...(g.k ? [`${HEADING[g.k]} (${byClass[g.k]})`, ''] : []),
      ...g.pairs.flatMap((p) => [
        `${pairTitle(p)}`,
        '',
        ...p.rows.flatMap((r) => {
          const [first, ...others] = labelsOf(r);
          const steps = stepLines(r);
          return [
            `${r.suiteSlug} × ${r.targetName} — ${r.pathName}`,
            `  input     z = ${c(r.z)}   bits ${r.zHex.re}, ${r.zHex.im}`,
            `  expected  ${c(r.expected)}`,
            `  actual    ${c(r.actual)}`,
            `  diagnosis ${first}`,
            ...others.map((l) => `  also      ${l}`),
            ...(r.choice ? [`  choice    ${choiceOf(r.choice)}`] : []),
            ...steps.map((l, i) => `${i === 0 ? '  steps     ' : '            '}${l}`),
            `  rule      ${r.rule}`,
            `  reproduce ${r.reproducer.split('\n').join('\n            ')}`,
            `  case      ${link(r.id)}`,
            '',
          ];
        }),
      ]),
    ]),
    more > 0 ? `…and ${more} more: ${runLink}` : '',
    scope,
  ].join('\n');
  const line = (label: string, value: string) =>
    `<tr><th align="left" valign="top" style="width: 6.5em; font-weight: normal; color: #4D5A68">${label}</th><td style="word-break: break-word">${value}</td></tr>`;
  const html = `<!doctype html><html><body style="font-family: sans-serif">
<p>${escape(lead)}</p>
${classLine ? `<p><strong>${escape(classLine)}</strong></p>\n` : ''}${total > 0 ? summary.html : ''}${
    stopped.length > 0
      ? `<h3 style="font-size: 1em">${escape(stoppedHeading)}</h3>
<ul>${stoppedLines.map((l) => `<li>${escape(l)}</li>`).join('')}</ul>
<p><a href="${escape(runLink)}">the run</a></p>\n`
      : ''
  }
<p>${escape(changesLine)}</p>
${groups
  .map(
    (g) =>
      `${g.k ? `<h3 style="font-size: 1em">${escape(`${HEADING[g.k]} (${byClass[g.k]})`)}</h3>\n` : ''}${g.pairs
        .map(
          (p) => `<h4 style="font-size: 1em; margin-bottom: 0.3em">${escape(pairTitle(p))}</h4>
<table cellpadding="6" style="border-collapse: collapse; width: 100%; max-width: 720px" border="1">
<tbody>
${p.rows
  .map((r) => {
    const [first, ...others] = labelsOf(r);
    const steps = stepLines(r);
    return [
      `<tr><th colspan="2" align="left" style="background: #F4F1EA">${escape(`${r.suiteSlug} × ${r.targetName}`)} — ${escape(r.pathName)}</th></tr>`,
      line('Input', `<code>z = ${escape(c(r.z))}</code><br><code>bits ${escape(`${r.zHex.re}, ${r.zHex.im}`)}</code>`),
      line('Expected', `<code>${escape(c(r.expected))}</code>`),
      line('Actual', `<code>${escape(c(r.actual))}</code>`),
      line('Diagnosis', [first!, ...others].map(escape).join('<br>')),
      ...(r.choice ? [line('Choice', escape(choiceOf(r.choice)))] : []),
      ...(steps.length ? [line('Steps', steps.map(escape).join('<br>'))] : []),
      line('Rule', escape(r.rule)),
      line(
        'Reproducer',
        `<pre style="white-space: pre-wrap; word-break: break-all; margin: 0">${escape(r.reproducer)}</pre>`,
      ),
      line('Case', `<a href="${escape(link(r.id))}">open the case</a>`),
    ].join('\n');
  })
  .join('\n')}
</tbody></table>`,
        )
        .join('\n')}`,
  )
  .join('\n')}
${more > 0 ? `<p>…and ${more} more: <a href="${escape(runLink)}">the whole run</a></p>` : ''}
<p><small>${escape(scope)}</small></p>
</body></html>`;
  return {
    kind: 'regression',
    recipients: input.recipients,
    subject,
    text,
    html,
    idempotencyKey: input.idempotencyKey,
  };
}

/** The rows of one class split per suite × target, as they come (mark-regressions.ts reads them biggest pair first). */
function pairsOf(rows: RegressionRow[]): { suite: string; target: string; total: number; rows: RegressionRow[] }[] {
  const pairs = new Map<string, { suite: string; target: string; total: number; rows: RegressionRow[] }>();
  for (const r of rows) {
    const key = `${r.suiteSlug}\u0000${r.targetName}`;
    const pair = pairs.get(key) ?? { suite: r.suiteSlug, target: r.targetName, total: r.groupTotal, rows: [] };
    pair.rows.push(r);
    pairs.set(key, pair);
  }
  return [...pairs.values()].sort((a, b) => b.total - a.total);
}

/** A group's heading: the pair, its regressions in this class, and how many are listed when not all. */
function pairTitle(p: { suite: string; target: string; total: number; rows: RegressionRow[] }): string {
  const listed = p.rows.length < p.total ? `, ${p.rows.length} listed here` : '';
  return `${p.suite} × ${p.target}: ${plural(p.total, 'regression')}${listed}`;
}

/** A row's place in the class order; rows without a class (none are mailed today) last. */
function rankOf(k: DiagnosisClass | null): number {
  return k === null ? DIAGNOSIS_CLASSES.length : DIAGNOSIS_CLASSES.indexOf(k);
}
