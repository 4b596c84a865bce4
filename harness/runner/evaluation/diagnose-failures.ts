import type { PointOutcome } from '../../../shared/point-outcome';
import { checkValue } from '../../checks/check-value';
import type { ComplexDouble } from '../../checks/complex-double';
import { diagnoseFailure } from '../../checks/diagnose-failure';
import { measureInaccuracy } from '../../checks/measure-inaccuracy';
import { errorText } from './error-text';
import type { PathRun } from './path-run';

/** A failure this close to the expected value (relative) can only be inaccurate: see below. */
const MERELY_INACCURATE = 1e-9;

/** Labels each failure against the alternatives the expectation computes, into `run.labels` (diagnoseFailure). */
export function diagnoseFailures(run: PathRun): void {
  const { re, im } = run.inputs;
  const ere = run.expected.re;
  const eim = run.expected.im;
  const are = run.actual.re;
  const aim = run.actual.im;
  const tol = run.suite.tolerances.values;
  const straddle = run.path.kind === 'straddle';
  for (const i of run.failing) {
    const exp: ComplexDouble = [ere[i] as number, eim[i] as number];
    const act: ComplexDouble = [are[i] as number, aim[i] as number];
    const o = run.outcomes[i] as Extract<PointOutcome, { kind: 'fail' }>;
    // Merely inaccurate: within 1e-9 of the expected value, finite, zero signs right, at an input
    // with no zero part and off a straddle. Every alternative (other sheet, other side, flipped
    // zero) is then far further away, so none is computed; the listed findings still get theirs.
    if (
      !straddle &&
      o.relativeError <= MERELY_INACCURATE &&
      re[i] !== 0 &&
      im[i] !== 0 &&
      are[i] !== 0 &&
      aim[i] !== 0 &&
      ere[i] !== 0 &&
      eim[i] !== 0
    ) {
      run.labels[i] = [measureInaccuracy(act, exp)];
      continue;
    }
    let alt;
    try {
      alt = run.expectation.alternatives(run.path, run.points, i, exp);
    } catch (e) {
      alt = { rule: `(alternatives unavailable: ${errorText(e)})` };
    }
    run.alternatives.set(i, alt);
    const check = {
      pass: false,
      ulps: o.ulps,
      relativeError: o.relativeError,
      zeroSignDiffers: [] as ('re' | 'im')[],
      finitenessDiffers: false,
    };
    const full =
      act.every(Number.isFinite) && exp.every(Number.isFinite) && !act.some((x) => x === 0)
        ? check
        : checkValue(act, exp, tol, run.expectation.zeroSigns);
    // A composed subject whose step before the last lost an exact zero first (a power that left
    // −2e−15 where the reference has 0): the final value's likeness to the value at the flipped
    // input is that step's doing, not the input's zero read wrongly, so the final value is named by
    // what it is (the other side of a cut, another sheet), and the finding names the step
    // (trace-steps.ts).
    run.labels[i] = diagnoseFailure({
      actual: act,
      expected: exp,
      check: full,
      tolerance: tol,
      flippedZero: run.zeroLostBefore.has(i) ? undefined : alt.flippedZero,
      otherSide: alt.otherSide,
      otherSheets: alt.otherSheets,
    });
  }
}
