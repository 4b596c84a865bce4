import { checkValue } from '../../checks/check-value';
import { oppositeSign } from '../../checks/opposite-sign';
import { relativeError } from '../../checks/relative-error';
import { ulpsApart } from '../../checks/ulps-apart';
import type { PathRun } from './path-run';

/**
 * The check loop: each point's library value against its expected value. Identical bits pass at
 * once; otherwise ulps (or relative error) in doubles; only failures get the full comparison.
 * Counts pass, fail, error, skipped and not applicable in `run.out`; fills `run.outcomes`,
 * `failing` and `errored`. Through an entry that cannot carry the sign of a zero imaginary part (a
 * plain number), a result's zero imaginary part is read as having the reference's sign: the
 * entry's value has no imaginary part at all, so it cannot be wrong about that sign.
 */
export function checkPoints(run: PathRun): void {
  const { out, outcomes, failing, errored, skipReasons } = run;
  const n = run.points.length;
  const tol = run.suite.tolerances.values;
  const tolUlps = 'ulps' in tol ? tol.ulps : -1;
  const tolRel = 'relative' in tol ? tol.relative : -1;
  const zeroSigns = run.expectation.zeroSigns;
  const ere = run.expected.re;
  const eim = run.expected.im;
  const are = run.actual.re;
  const aim = run.actual.im;
  const hasSkips = run.expected.skipped.size > 0;
  const hasErrors = run.actual.errors.size > 0;
  const hasNotApplicable = run.notApplicable.size > 0;
  const imaginarySignless = !run.entry.carries.imaginaryZeroSign;
  for (let i = 0; i < n; i++) {
    if (hasNotApplicable && run.notApplicable.has(i)) {
      outcomes[i] = { kind: 'not-applicable', reason: run.notApplicable.get(i) as string };
      out.counts.notApplicable++;
      continue;
    }
    if (hasSkips && run.expected.skipped.has(i)) {
      const reason = run.expected.skipped.get(i) as string;
      skipReasons.set(reason, (skipReasons.get(reason) ?? 0) + 1);
      out.counts.skipped++;
      continue;
    }
    if (hasErrors && run.actual.errors.has(i)) {
      outcomes[i] = { kind: 'error', message: run.actual.errors.get(i) as string };
      out.counts.error++;
      errored.push(i);
      continue;
    }
    const ar = are[i] as number;
    const er = ere[i] as number;
    const ei = eim[i] as number;
    const ai = imaginarySignless && aim[i] === 0 && ei === 0 ? ei : (aim[i] as number);
    if (
      ar === er &&
      ai === ei &&
      (!zeroSigns || ((ar !== 0 || Object.is(ar, er)) && (ai !== 0 || Object.is(ai, ei))))
    ) {
      out.counts.pass++;
      continue;
    }
    if (
      ar - ar === 0 &&
      ai - ai === 0 &&
      er - er === 0 &&
      ei - ei === 0 &&
      !(zeroSigns && ((ar === 0 && er === 0 && !Object.is(ar, er)) || (ai === 0 && ei === 0 && !Object.is(ai, ei))))
    ) {
      // Finite, zero signs right: ulps without BigInt, and the outcome of a failure without checkValue.
      const u = Math.max(ulpsApart(ar, er), ulpsApart(ai, ei));
      // Within the ulps bound passes without the relative error; otherwise the normwise bound
      // decides (withinTolerance: as the other half of an either-bound tolerance it does not
      // forgive a part of the opposite sign).
      const rel = tolUlps >= 0 && u <= tolUlps ? 0 : relativeError([ar, ai], [er, ei]);
      if (
        (tolUlps >= 0 && u <= tolUlps) ||
        (tolRel >= 0 && rel <= tolRel && !(tolUlps >= 0 && oppositeSign(ar, ai, er, ei)))
      ) {
        out.counts.pass++;
        continue;
      }
      failing.push(i);
      outcomes[i] = {
        kind: 'fail',
        diagnosis: { kind: 'unexplained', relativeError: rel },
        ulps: u,
        relativeError: rel,
      };
      continue;
    }
    const check = checkValue([ar, ai], [er, ei], tol, zeroSigns);
    if (check.pass) {
      out.counts.pass++;
      continue;
    }
    failing.push(i);
    outcomes[i] = {
      kind: 'fail',
      diagnosis: { kind: 'unexplained', relativeError: check.relativeError },
      ulps: check.ulps,
      relativeError: check.relativeError,
    };
  }
  out.counts.fail = failing.length;
}
