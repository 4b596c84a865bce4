import type { Diagnosis } from '../../shared/diagnosis';
import type { ComplexDouble } from './complex-double';
import { relativeError } from './relative-error';
import { ulpsApart } from './ulps-apart';
import { worstPart } from './worst-part';

/**
 * A part smaller than the whole value by more than this factor (2^−26 = √eps ≈ 1.5e−8) is "lost
 * to cancellation" when it carries the worst ulp distance. A careful library computes a complex
 * value to a few eps normwise (complex multiplication alone: √5·2^−53, Brent, Percival and
 * Zimmermann, Math. Comp. 76 (2007)); an error of one eps of the whole value reads as
 * |value| / |part| ulps in the part. Below 2^−26 that is over 6.7e7 ulps for an error the whole
 * value does not notice, a count that says nothing about how the part was computed, so the
 * absolute error and |value| are reported instead. Above it a part holds at least half the
 * significand's bits of the whole value and its ulps still mean what they say.
 */
const CANCELLATION = 2 ** -26;

/**
 * The `inaccurate` label of a finite value against the value it should equal (the expected one,
 * or the reference at the flipped zero it matches): the larger per-part ulp distance, the
 * normwise relative error, the worst part and whether its sign differs, both parts' ulps and
 * absolute errors, and `cancellation` when the worst part is tiny beside the whole value.
 */
export function measureInaccuracy(
  actual: ComplexDouble,
  reference: ComplexDouble,
): Extract<Diagnosis, { kind: 'inaccurate' }> {
  const part = (i: 0 | 1) => ({
    ulps: ulpsApart(actual[i], reference[i]),
    absolute: Math.abs(actual[i] - reference[i]),
  });
  const parts = { re: part(0), im: part(1) };
  const worst = worstPart(actual, reference);
  const magnitude = Math.hypot(reference[0], reference[1]);
  const worstValue = Math.abs(worst.part === 're' ? reference[0] : reference[1]);
  return {
    kind: 'inaccurate',
    ulps: Math.max(parts.re.ulps, parts.im.ulps),
    relativeError: relativeError(actual, reference),
    ...worst,
    parts,
    ...(worstValue < magnitude * CANCELLATION
      ? { cancellation: { part: worst.part, absoluteError: parts[worst.part].absolute, magnitude } }
      : {}),
  };
}
