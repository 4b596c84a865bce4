import { ulpDistance } from '../../harness/reference/numbers/ulp-distance';

/**
 * Whether two doubles agree sign-exactly: both NaN, or the same sign bit and within
 * `ulps` units in the last place (0 for exact equality).
 */
export function sameDouble(a: number, b: number, ulps = 0): boolean {
  if (a !== a || b !== b) return a !== a && b !== b;
  if (Object.is(a, -0) !== Object.is(b, -0) || Math.sign(a) !== Math.sign(b)) return false;
  return ulpDistance(a, b) <= ulps;
}
