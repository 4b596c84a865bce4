import { approachZero } from './approach-zero';

/**
 * One coordinate of a + t·(b − a) with exact ends: t = 0 gives a and t = 1 gives b
 * with their zero signs. A constant coordinate (a === b) stays a, sign included.
 * From the far end (t > ½) it computes b − (1 − t)·(b − a), so each half is
 * anchored at its nearer end; 1 − t is exact there. An interior zero gets the sign
 * of the side the segment comes from (approach-zero.ts).
 */
export function lerpComponent(a: number, b: number, t: number): number {
  if (t === 0) return a;
  if (t === 1) return b;
  if (a === b) return a;
  const d = b - a;
  const x = t <= 0.5 ? a + t * d : b - (1 - t) * d;
  return x === 0 ? approachZero(t, d, a) : x;
}
