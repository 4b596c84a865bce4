import type { Diagnosis } from '../../../shared/diagnosis';
import type { PointOutcome } from '../../../shared/point-outcome';
import type { AgreementSummary } from '../../../shared/run-result';
import { checkValue } from '../../checks/check-value';
import type { ComplexDouble } from '../../checks/complex-double';
import { errorText } from './error-text';
import { evaluateProgram } from './evaluate-program';
import { expectedColumnOf } from './expected-column-of';
import type { PathRun } from './path-run';
import type { SuiteCounterpart } from './suite-counterpart';
import { wireDouble } from './wire-double';

/**
 * Each counterpart of the suite at every point the suite itself checked (not skipped): evaluated
 * through the same library (its own program, its own entry) and compared with the suite's value
 * as a value is compared with the reference (the suite's value tolerance; zero signs under the
 * signed-zero convention). Two values that each pass against their reference are not told apart
 * (they may still be up to twice the tolerance apart). Where they differ the point gets a `disagreement` label naming the
 * counterpart, its value, and whether that value is its own reference's: a point that passed
 * becomes a failure, one that failed gains the label. Where only one way gave a value the path
 * says so (`agreements[].oneSided`) and nothing is compared.
 */
export async function checkAgreement(run: PathRun): Promise<void> {
  if (run.counterparts.length === 0) return;
  const { out, inputs, actual, expected, points } = run;
  const tol = run.suite.tolerances.values;
  const zeroSigns = run.expectation.zeroSigns;
  const n = points.length;
  // The suite's own verdicts, before any counterpart turns a passing point into a disagreement.
  const ownFailures = new Set(run.failing);
  out.agreements = [];
  for (const c of run.counterparts) {
    const summary: AgreementSummary = { with: c.with, compared: 0, disagreed: 0, oneSided: [] };
    out.agreements.push(summary);
    const oneSided = new Map<string, number>();
    const say = (reason: string) => oneSided.set(reason, (oneSided.get(reason) ?? 0) + 1);
    // Not applicable to the entry: nothing of the suite's own was checked there.
    const checked = (i: number) => !expected.skipped.has(i) && !run.notApplicable.has(i);
    if (c.unsupported.length > 0) {
      for (let i = 0; i < n; i++)
        if (checked(i) && !actual.errors.has(i))
          say(`${c.with}: ${run.target.name} has no ${c.unsupported.join(', ')}`);
      summary.oneSided = [...oneSided].map(([reason, count]) => ({ reason, count }));
      continue;
    }
    // A counterpart without an entry of its own goes in through the path's, as the suite's value does.
    const other = await evaluateProgram(
      c.program,
      run.target,
      inputs.re,
      inputs.im,
      run.signal,
      c.entry ?? run.entry.name,
    );
    const reference = otherReference(run, c);
    for (let i = 0; i < n; i++) {
      if (!checked(i)) continue;
      const mine = actual.errors.get(i);
      const theirs = other.errors.get(i);
      if (mine !== undefined && theirs !== undefined) continue;
      if (mine !== undefined) {
        say(`only ${c.with} gave a value (${run.suite.subject}: ${mine})`);
        continue;
      }
      if (theirs !== undefined) {
        say(`only ${run.suite.subject} gave a value (${c.with}: ${theirs})`);
        continue;
      }
      summary.compared++;
      const a: ComplexDouble = [actual.re[i] as number, actual.im[i] as number];
      const b: ComplexDouble = [other.re[i] as number, other.im[i] as number];
      if (checkValue(b, a, tol, zeroSigns).pass) continue;
      const ref = reference instanceof Error ? null : reference.at(i);
      const otherMatchesReference = ref !== null && checkValue(b, ref, tol, zeroSigns).pass;
      // Both within the tolerance of the reference (3 ulps above it and 3 below, say): two right
      // values, not a disagreement a maintainer should act on.
      const mineMatches = !ownFailures.has(i);
      if (mineMatches && otherMatchesReference) continue;
      summary.disagreed++;
      const label: Diagnosis = { kind: 'disagreement', with: c.with, other: wireDouble(b), otherMatchesReference };
      addLabel(run, i, label, a);
    }
    if (reference instanceof Error) summary.note = `no reference for ${c.with}: ${reference.message}`;
    summary.oneSided = [...oneSided].map(([reason, count]) => ({ reason, count }));
  }
}

/** The counterpart's own expected value at a point (null where it has none), or why there is none at all. */
function otherReference(run: PathRun, c: SuiteCounterpart): { at: (i: number) => ComplexDouble | null } | Error {
  const column = (() => {
    if (!c.expectation) return run.expected;
    try {
      return expectedColumnOf({ cache: run.cache, path: run.path, ...c.expectation }, run.points);
    } catch (e) {
      return new Error(errorText(e));
    }
  })();
  if (column instanceof Error) return column;
  return { at: (i) => (column.skipped.has(i) ? null : [column.re[i] as number, column.im[i] as number]) };
}

/** Puts a disagreement on point i: a passing point becomes a failure with it; a failing one gains it. */
function addLabel(run: PathRun, i: number, label: Diagnosis, value: ComplexDouble): void {
  const known = run.labels[i];
  if (known) {
    // listFindings puts branch labels (this one) before accuracy labels.
    known.push(label);
    return;
  }
  run.labels[i] = [label];
  const exp: ComplexDouble = [run.expected.re[i] as number, run.expected.im[i] as number];
  const own = checkValue(value, exp, run.suite.tolerances.values, run.expectation.zeroSigns);
  const outcome: PointOutcome = { kind: 'fail', diagnosis: label, ulps: own.ulps, relativeError: own.relativeError };
  run.outcomes[i] = outcome;
  run.failing.push(i);
  run.out.counts.pass--;
  run.out.counts.fail++;
}
