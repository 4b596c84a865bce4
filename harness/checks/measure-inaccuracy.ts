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
 * or the reference at the flipped zero it matches): the normwise relative error, both parts'
 * ulps and absolute errors, and the part that carries the error with its ulps and whether its
 * sign differs. That part is the one further off in ulps, unless it is lost to cancellation with
 * its sign right and the other part is further off absolutely: complex.js's acos(1000001 + 1e−300i) has a real part
 * 0 for 1e−306 (2.9e16 ulps, 1e−306 absolute) and an imaginary part 8.6e−6 off (4.8e9 ulps); the
 * imaginary part is the story. `cancellation` is set when the part told is lost to cancellation
 * (asech(1000001 + 1e−9i): real part −5.6e−17 for 1e−21, the imaginary part exact; a tiny part of
 * the opposite sign is told even beside a larger absolute error elsewhere, as it is what a
 * two-bound tolerance does not forgive).
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
  const magnitude = Math.hypot(reference[0], reference[1]);
  const cancelled = (p: 're' | 'im') => Math.abs(p === 're' ? reference[0] : reference[1]) < magnitude * CANCELLATION;
  const signDiffers = (p: 're' | 'im') => {
    const [a, e] = p === 're' ? [actual[0], reference[0]] : [actual[1], reference[1]];
    return a !== 0 && e !== 0 && Math.sign(a) !== Math.sign(e);
  };
  const byUlps = worstPart(actual, reference).part;
  const other = byUlps === 're' ? 'im' : 're';
  const told =
    cancelled(byUlps) && !signDiffers(byUlps) && parts[other].absolute > parts[byUlps].absolute ? other : byUlps;
  return {
    kind: 'inaccurate',
    ulps: parts[told].ulps,
    relativeError: relativeError(actual, reference),
    part: told,
    signDiffers: signDiffers(told),
    parts,
    ...(cancelled(told) ? { cancellation: { part: told, absoluteError: parts[told].absolute, magnitude } } : {}),
  };
}
