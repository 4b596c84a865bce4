import type { ComplexDouble } from './complex-double';
import { ulpsApart } from './ulps-apart';

/**
 * Which part of a finite value carries its larger ulp distance from the reference, and whether
 * that part has the opposite sign (both non-zero). Per-part ulps across zero are huge even when
 * the values are tiny: asech(1000001 + 1e−9i) has real part 1.0e−21 and a library that returns
 * −5.6e−17 is 8.7e18 ulps off there while the whole value is within 3.5e−17 relative (seen in
 * the demo runs). Saying "real part, opposite sign" tells a reviewer that it is a small part
 * lost to cancellation, and on the wrong side of zero, not a wild value.
 */
export function worstPart(actual: ComplexDouble, expected: ComplexDouble): { part: 're' | 'im'; signDiffers: boolean } {
  const apart = (i: 0 | 1) =>
    Number.isFinite(actual[i]) && Number.isFinite(expected[i]) ? ulpsApart(actual[i], expected[i]) : Infinity;
  const i = apart(1) > apart(0) ? 1 : 0;
  const a = actual[i];
  const e = expected[i];
  return { part: i === 0 ? 're' : 'im', signDiffers: a !== 0 && e !== 0 && Math.sign(a) !== Math.sign(e) };
}
