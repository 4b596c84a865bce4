import type { PathResult } from '../../../shared/run-result';
import { checkAgreement } from './check-agreement';
import { inexpressibleReason } from '../../adapters/inexpressible-reason';
import { checkPoints } from './check-points';
import { compareAlongPath } from './compare-along-path';
import { diagnoseFailures } from './diagnose-failures';
import { emptyClassCounts } from './empty-class-counts';
import { emptyCounts } from './empty-counts';
import { errorText } from './error-text';
import { evaluateProgram } from './evaluate-program';
import { excuseUnexpressedSides } from './excuse-unexpressed-sides';
import { expectedColumnOf } from './expected-column-of';
import { listFindings } from './list-findings';
import { pathInputs } from './path-inputs';
import { traceSteps } from './trace-steps';
import type { PathEvaluation } from './path-evaluation';
import type { PathRun } from './path-run';

/**
 * One path of a suite against one target, in named steps: the expected values (expectedColumnOf)
 * and the library's (evaluateProgram) at every point; checkPoints compares them; traceSteps puts
 * a composed subject's steps beside the reference's at the failures whose label depends on them,
 * and (once the labels are final) at the listed ones; diagnoseFailures explains each failure;
 * compareAlongPath finds jumps, misplaced cuts and the monodromy along a continuous path;
 * checkAgreement compares the suite's counterparts; listFindings writes the failures out. A path
 * that cannot be built is an error,
 * and every point is skipped when the target lacks an operation of the subject.
 */
export async function evaluatePath(evaluation: PathEvaluation): Promise<PathResult> {
  const { path, points } = evaluation;
  const out: PathResult = {
    name: path.name,
    kind: path.kind,
    points: Array.isArray(points) ? points.length : 0,
    counts: emptyCounts(),
    jumps: null,
    monodromy: null,
    findings: [],
    findingsOmitted: 0,
    skipped: [],
    byDiagnosis: {},
    byClass: emptyClassCounts(),
  };
  if (points instanceof Error) {
    out.error = `the path cannot be built: ${points.message}`;
    return out;
  }
  const n = points.length;
  if (evaluation.unsupported.length > 0) {
    out.counts.skipped = n;
    out.skipped = [
      {
        reason: `${evaluation.target.name} has no ${evaluation.unsupported.join(', ')}`,
        count: n,
        lacks: evaluation.unsupported,
      },
    ];
    return out;
  }
  const inputs = pathInputs(points);
  let expected;
  try {
    expected = expectedColumnOf(evaluation, points);
  } catch (e) {
    out.error = `no expected values: ${errorText(e)}`;
    out.counts.error = n;
    return out;
  }
  const { entry } = evaluation;
  if (evaluation.path.entry !== undefined) out.entry = entry.name;
  const notApplicable = new Map<number, string>();
  // An input's zero sign picks the side of a cut under signed zeros, for principal and regular
  // branches alike (a regular branch compares no output zero signs, but its inputs' still count).
  const zeroSigns = evaluation.suite.convention === 'signed-zero';
  const { carries } = entry;
  // An entry that carries everything expresses every point: no loop (bench:harness).
  if (!carries.imaginaryPart || !carries.imaginaryZeroSign || !carries.realZeroSign)
    for (let i = 0; i < n; i++) {
      const reason = inexpressibleReason(entry, inputs.re[i] as number, inputs.im[i] as number, zeroSigns);
      if (reason !== null) notApplicable.set(i, reason);
    }
  const { targetConvention } = evaluation;
  if (targetConvention) {
    let theirs;
    try {
      theirs = expectedColumnOf({ ...evaluation, ...targetConvention }, points);
    } catch {
      theirs = null; // No values under the target's convention: every point keeps the suite's.
    }
    const { reason } = targetConvention;
    // Equal values mean the same under both; a zero's sign counts only where the expectation compares
    // the value's zero signs (principal signed-zero suites; never a regular branch's).
    const signs = evaluation.expectation.zeroSigns;
    const same = (x: number, y: number) => Object.is(x, y) || (x === y && !signs);
    for (let i = 0; theirs && i < n; i++) {
      if (notApplicable.has(i) || expected.skipped.has(i) || theirs.skipped.has(i)) continue;
      if (
        !same(expected.re[i] as number, theirs.re[i] as number) ||
        !same(expected.im[i] as number, theirs.im[i] as number)
      )
        notApplicable.set(i, reason);
    }
  }
  const actual = await evaluateProgram(
    evaluation.program,
    evaluation.target,
    inputs.re,
    inputs.im,
    evaluation.signal,
    entry.name,
  );
  const run: PathRun = {
    ...evaluation,
    points,
    inputs,
    expected,
    actual,
    out,
    notApplicable,
    skipReasons: new Map(),
    outcomes: new Array(n).fill(null),
    failing: [],
    errored: [],
    labels: new Array(n).fill(null),
    alternatives: new Map(),
    traces: new Map(),
    zeroLostBefore: new Set(),
  };
  checkPoints(run);
  traceSteps(run, 'labels');
  diagnoseFailures(run);
  excuseUnexpressedSides(run);
  await compareAlongPath(run);
  await checkAgreement(run);
  traceSteps(run, 'listed');
  listFindings(run);
  out.skipped = [...run.skipReasons].map(([reason, count]) => ({ reason, count }));
  if (notApplicable.size > 0) {
    const byReason = new Map<string, number>();
    for (const reason of notApplicable.values()) byReason.set(reason, (byReason.get(reason) ?? 0) + 1);
    out.notApplicable = [...byReason].map(([reason, count]) => ({ reason, count }));
  }
  return out;
}
