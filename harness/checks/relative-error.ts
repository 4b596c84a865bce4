import type { ComplexDouble } from './complex-double';

/**
 * Normwise relative error |actual − expected| / |expected|, computed with hypot so it
 * neither overflows near 1e308 nor underflows near 1e-308. With expected = 0 it is the
 * absolute error (0 when both are zero); NaN or infinite parts give Infinity unless both
 * values agree exactly there.
 */
export function relativeError(actual: ComplexDouble, expected: ComplexDouble): number {
  const [ar, ai] = actual;
  const [er, ei] = expected;
  if ([ar, ai, er, ei].some((x) => !Number.isFinite(x))) {
    const same = (a: number, e: number) => (Number.isNaN(a) && Number.isNaN(e)) || a === e;
    return same(ar, er) && same(ai, ei) ? 0 : Infinity;
  }
  // Near ±1.8e308 the difference of opposite signs overflows: scale all four by the same
  // power of two (exact) first; the ratio does not change.
  const s = Math.max(Math.abs(ar), Math.abs(ai), Math.abs(er), Math.abs(ei)) > 2 ** 1000 ? 2 ** -600 : 1;
  const diff = Math.hypot(ar * s - er * s, ai * s - ei * s);
  const size = Math.hypot(er * s, ei * s);
  return size === 0 ? diff : diff / size;
}
