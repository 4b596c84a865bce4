import type { ComplexPair } from '../adapters/complex-pair';
import type { PlaneCut } from '../cuts/plane-cut';

/**
 * The part of a cut inside the box [min, max] as a segment, or null when the cut misses the
 * box. Parametric clipping (Liang–Barsky): p(s) = from + s·(to − from) with s ∈ [0, 1] for a
 * segment and s ≥ 0 for a ray, narrowed by each of the four edges.
 */
export function clipCut(cut: PlaneCut, min: ComplexPair, max: ComplexPair): [ComplexPair, ComplexPair] | null {
  const d: ComplexPair = [cut.to[0] - cut.from[0], cut.to[1] - cut.from[1]];
  let lo = 0;
  let hi = cut.toInfinity ? Infinity : 1;
  for (const k of [0, 1] as const) {
    if (d[k] === 0) {
      if (cut.from[k] < min[k] || cut.from[k] > max[k]) return null;
      continue;
    }
    const a = (min[k] - cut.from[k]) / d[k];
    const b = (max[k] - cut.from[k]) / d[k];
    lo = Math.max(lo, Math.min(a, b));
    hi = Math.min(hi, Math.max(a, b));
  }
  if (!(lo <= hi) || !Number.isFinite(hi)) return null;
  const at = (s: number): ComplexPair => [cut.from[0] + s * d[0], cut.from[1] + s * d[1]];
  return [at(lo), at(hi)];
}
