import type { ComplexPair } from '../adapters/complex-pair';

/** The distance from p to the segment [a, b]. */
export function distanceToSegment(p: ComplexPair, a: ComplexPair, b: ComplexPair): number {
  const [dx, dy] = [b[0] - a[0], b[1] - a[1]];
  const length2 = dx * dx + dy * dy;
  const s = length2 === 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / length2));
  return Math.hypot(p[0] - (a[0] + s * dx), p[1] - (a[1] + s * dy));
}
