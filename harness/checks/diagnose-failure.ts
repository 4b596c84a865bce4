import type { Diagnosis } from '../../shared/diagnosis';
import type { ComplexDouble } from './complex-double';
import type { FailureContext } from './failure-context';
import { relativeError } from './relative-error';
import { worstPart } from './worst-part';

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
 * Chooses the diagnosis of a failing point (docs/vocabulary.md), in this order: a non-finite part;
 * the value the reference gives with an input zero flipped; a right value with a wrong output
 * zero sign; the other side of the cut or another sheet, whichever is nearer when both match
 * to 1e-6; and then the nearest of all these
 * candidates — the expected value itself meaning `inaccurate` — if any is within 10 %.
 * `misplaced-cut` is decided along a path (findMisplacedCuts), not here.
 */
export function diagnoseFailure(ctx: FailureContext): Diagnosis {
  const { actual, expected, check } = ctx;
  if (check.finitenessDiffers) return { kind: 'not-finite' };
  if (ctx.flippedZero && sameSigned(actual, ctx.flippedZero.value) && !sameSigned(actual, expected)) {
    return { kind: 'zero-sign', part: ctx.flippedZero.part, of: 'input' };
  }
  if (check.zeroSignDiffers.length > 0 && relativeError(actual, expected) <= SAME) {
    return { kind: 'zero-sign', part: check.zeroSignDiffers[0]!, of: 'output' };
  }
  const candidates: { diagnosis: Diagnosis; distance: number }[] = [
    {
      diagnosis: {
        kind: 'inaccurate',
        ulps: check.ulps,
        relativeError: check.relativeError,
        ...worstPart(actual, expected),
      },
      distance: relativeError(actual, expected),
    },
  ];
  if (ctx.otherSide)
    candidates.push({ diagnosis: { kind: 'cut-side' }, distance: relativeError(actual, ctx.otherSide) });
  for (const sheet of ctx.otherSheets ?? [])
    candidates.push({ diagnosis: { kind: 'other-sheet', k: sheet.k }, distance: relativeError(actual, sheet.value) });
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
  return nearest.distance <= RECOGNISABLE
    ? nearest.diagnosis
    : { kind: 'unexplained', relativeError: check.relativeError };
}
