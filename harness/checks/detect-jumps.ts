import type { ComplexDouble } from './complex-double';

/** A step jumps when it is this many times the median step… */
const MEDIAN_FACTOR = 8;
/** …and at least this fraction of the values' size (so round-off on a flat stretch is no jump). */
const SIZE_FRACTION = 1e-3;

/**
 * For values sampled along a continuous path, which steps jump: step i (between points i and
 * i + 1) jumps when |v[i+1] − v[i]| is more than 8 times the median step and more than 1e-3 of
 * the values' size. A step next to a non-finite value is not called a jump (the points say so).
 * With 65 samples on a circle of radius 1 around 0, √z moves ~0.1 per step and jumps by 2
 * across its cut; log moves ~0.1 and jumps by 2π: both are well beyond 8 median steps.
 */
export function detectJumps(values: readonly ComplexDouble[]): boolean[] {
  const steps: number[] = [];
  for (let i = 0; i + 1 < values.length; i += 1) {
    const a = values[i]!;
    const b = values[i + 1]!;
    steps.push([...a, ...b].every(Number.isFinite) ? Math.hypot(b[0] - a[0], b[1] - a[1]) : NaN);
  }
  const finite = steps.filter((s) => !Number.isNaN(s)).sort((x, y) => x - y);
  const median = finite.length > 0 ? finite[Math.floor(finite.length / 2)]! : 0;
  return steps.map((s, i) => {
    if (Number.isNaN(s)) return false;
    const size = Math.max(Math.hypot(...values[i]!), Math.hypot(...values[i + 1]!));
    return s > MEDIAN_FACTOR * median && s > SIZE_FRACTION * size;
  });
}
