import type { Diagnosis } from '../../shared/diagnosis';
import type { Tolerance } from '../../shared/schemas/tolerance-schema';
import type { ComplexDouble } from './complex-double';
import type { FailureContext } from './failure-context';
import { measureInaccuracy } from './measure-inaccuracy';
import { oppositeSign } from './opposite-sign';
import { relativeError } from './relative-error';
import { ulpsApart } from './ulps-apart';
import { withinTolerance } from './within-tolerance';

/**
 * Two values are "the same" for diagnosis when they agree to 1e-6: a diagnosis says which
 * value a library returned, not how accurately (an inaccurate value on the wrong side is still
 * on the wrong side). The nearest-candidate rule below catches what falls between.
 */
const SAME = 1e-6;
/** Candidates this close (relative) are equally exact: the difference is round-off. */
const ROUND_OFF = 1e-12;
/** Beyond this relative error from every candidate, we do not pretend to know which value it is. */
const RECOGNISABLE = 0.1;

const signsOfZeros = (v: ComplexDouble) => v.map((x) => (x === 0 ? Object.is(x, -0) : null));
const sameSigned = (a: ComplexDouble, b: ComplexDouble) =>
  relativeError(a, b) <= SAME &&
  signsOfZeros(a).every((s, i) => s === null || signsOfZeros(b)[i] === null || s === signsOfZeros(b)[i]);

/**
 * The accuracy label of a value against the correctly rounded value it is on, when it is outside
 * the tolerance (a zero of the wrong sign counts as equal here: its sign is a label of its own).
 */
function accuracy(actual: ComplexDouble, on: ComplexDouble, tolerance: Tolerance): Diagnosis[] {
  const ulps = Math.max(ulpsApart(actual[0], on[0]), ulpsApart(actual[1], on[1]));
  return withinTolerance(tolerance, ulps, relativeError(actual, on), oppositeSign(actual[0], actual[1], on[0], on[1]))
    ? []
    : [measureInaccuracy(actual, on)];
}

/**
 * Every label of a failing point (docs/vocabulary.md), the leading one first, branch labels before
 * the accuracy label. The leading label is chosen in this order: a non-finite part; the value the
 * reference gives with an input zero flipped; a right value with a wrong output zero sign (one
 * label per part); the other side of the cut or another sheet, whichever is nearer when both
 * match to 1e-6; and then the nearest of all these candidates — the expected value itself
 * meaning `inaccurate` — if any is within 10 %. A value with a zero sign wrong (input or output)
 * is also measured against the value it is on and labelled `inaccurate` when outside the
 * tolerance there: a wrong −0 must not hide a part 1e5 ulps off. A value on the other side or
 * sheet is not measured again: those alternatives are not always correctly rounded (a
 * straddle's mirror point, a sheet turned in doubles), and an accuracy label against them would
 * be a guess. `misplaced-cut` is decided along a path (findMisplacedCuts), not here.
 */
export function diagnoseFailure(ctx: FailureContext): Diagnosis[] {
  const { actual, expected, check, tolerance } = ctx;
  if (check.finitenessDiffers) return [{ kind: 'not-finite' }];
  if (ctx.flippedZero && sameSigned(actual, ctx.flippedZero.value) && !sameSigned(actual, expected)) {
    return [
      { kind: 'zero-sign', part: ctx.flippedZero.part, of: 'input' },
      ...accuracy(actual, ctx.flippedZero.value, tolerance),
    ];
  }
  const outputZeros: Diagnosis[] = check.zeroSignDiffers.map((part) => ({ kind: 'zero-sign', part, of: 'output' }));
  if (outputZeros.length > 0 && relativeError(actual, expected) <= SAME)
    return [...outputZeros, ...accuracy(actual, expected, tolerance)];
  const candidates: { diagnosis: Diagnosis[]; distance: number }[] = [
    {
      diagnosis: [...outputZeros, ...accuracy(actual, expected, tolerance)],
      distance: relativeError(actual, expected),
    },
  ];
  if (ctx.otherSide)
    candidates.push({ diagnosis: [{ kind: 'cut-side' }], distance: relativeError(actual, ctx.otherSide) });
  for (const sheet of ctx.otherSheets ?? [])
    candidates.push({
      diagnosis: [{ kind: 'other-sheet', k: sheet.k }],
      distance: relativeError(actual, sheet.value),
    });
  // Near a cut several alternatives can be within 1e-6 of each other (at 1e-9 from the cut of
  // acot, the other side's limit and v + π differ by 1e-9): the nearest is the better account.
  // Alternatives that both match to round-off (on the cut of ∛, the other side's limit is the
  // sheet k = −1) are taken in the order above: the cut side says more about the point.
  const exact = candidates
    .slice(1)
    .filter((c) => c.distance <= SAME)
    .reduce<(typeof candidates)[number] | null>(
      (best, c) => (!best || Math.max(c.distance, ROUND_OFF) < Math.max(best.distance, ROUND_OFF) ? c : best),
      null,
    );
  if (exact) return exact.diagnosis;
  const nearest = candidates.reduce((best, c) => (c.distance < best.distance ? c : best));
  // Never no label: a failure this check would pass (a relative error rounded at the bound) is
  // measured all the same.
  if (nearest.diagnosis.length === 0) return [measureInaccuracy(actual, expected)];
  return nearest.distance <= RECOGNISABLE
    ? nearest.diagnosis
    : [{ kind: 'unexplained', relativeError: check.relativeError }];
}
