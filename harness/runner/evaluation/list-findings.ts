import type { Diagnosis } from '../../../shared/diagnosis';
import { diagnosisClass, type DiagnosisClass } from '../../../shared/diagnosis-class';
import { outcomeClass } from '../../../shared/outcome-class';
import type { PointOutcome } from '../../../shared/point-outcome';
import type { PointFinding } from '../../../shared/run-result';
import type { ComplexPair } from '../../adapters/complex-pair';
import { formatHexDouble } from '../../checks/format-hex-double';
import type { PathPoint } from '../../paths/path-point';
import type { PathRun } from './path-run';
import { listedPoints } from './listed-points';
import { reproducer } from './reproducer';
import { wireDouble } from './wire-double';

/**
 * Puts each failure's labels on its outcome (the leading one as its diagnosis) and counts them,
 * then lists the failing and erring points, branch findings first and in index order within each
 * class, up to `maxFindings`, each with its input's exact bits, both values, the rule that fixes
 * the expected value, the one-sided limits on a cut, a reproducer, and a composed subject's steps
 * and the choice behind the expected value where there is one (trace-steps.ts).
 */
export function listFindings(run: PathRun): void {
  const { out, outcomes, expected, actual, expectation, path, points } = run;
  for (const i of run.failing) {
    const o = outcomes[i] as Extract<PointOutcome, { kind: 'fail' }>;
    // Branch labels lead, accuracy follows (point-outcome.ts), whoever added them.
    const own = run.labels[i] as Diagnosis[];
    o.labels = [
      ...own.filter((l) => diagnosisClass(l.kind) === 'branch'),
      ...own.filter((l) => diagnosisClass(l.kind) !== 'branch'),
    ];
    o.diagnosis = o.labels[0] as Diagnosis;
    for (const label of o.labels) out.byDiagnosis[label.kind] = (out.byDiagnosis[label.kind] ?? 0) + 1;
    out.byClass[outcomeClass(o) as DiagnosisClass] += 1;
  }
  const expectedAt = (i: number): [number, number] => [expected.re[i] as number, expected.im[i] as number];
  for (const i of listedPoints(run)) {
    const p = points[i] as PathPoint;
    const z: ComplexPair = [p.z.re, p.z.im];
    let alt = run.alternatives.get(i);
    if (!alt && outcomes[i]?.kind === 'fail') {
      try {
        alt = expectation.alternatives(path, points, i, expectedAt(i));
      } catch {
        alt = undefined;
      }
    }
    const finding: PointFinding = {
      path: path.name,
      index: i,
      t: p.t,
      ...(p.label ? { label: p.label } : {}),
      z: wireDouble(z),
      zHex: { re: formatHexDouble(z[0]), im: formatHexDouble(z[1]) },
      expected: expected.skipped.has(i) ? null : wireDouble(expectedAt(i)),
      actual: actual.errors.has(i) ? null : wireDouble([actual.re[i] as number, actual.im[i] as number]),
      outcome: outcomes[i] as PointOutcome,
      rule: alt?.rule ?? '',
      reproducer: [
        reproducer(run.program, run.target, z, run.suite.subject, run.entry.name),
        // The other way of each disagreement, so both values can be reproduced; each snippet runs on its own.
        ...run.counterparts
          .filter((c) => run.labels[i]?.some((l) => l.kind === 'disagreement' && l.with === c.with))
          .map((c) => reproducer(c.program, run.target, z, c.with, c.entry ?? run.entry.name)),
      ].join('\n\n--- the other way, on its own ---\n\n'),
      ...run.traces.get(i),
    };
    if (alt?.limits)
      finding.limits = {
        sides: alt.limits.sides,
        values: [wireDouble(alt.limits.values[0]), wireDouble(alt.limits.values[1])],
      };
    if (!alt) {
      try {
        finding.rule = expectation.alternatives(path, points, i, expectedAt(i)).rule;
      } catch {
        finding.rule = '';
      }
    }
    out.findings.push(finding);
  }
  out.findingsOmitted = Math.max(0, run.failing.length + run.errored.length - run.maxFindings);
}
