import type { ComplexDouble } from './complex-double';

/** A step jumps when it is this many times the median of its neighbouring steps… */
const NEIGHBOUR_FACTOR = 8;
/** …and at least this fraction of the values' size (so round-off on a flat stretch is no jump). */
const SIZE_FRACTION = 1e-3;
/** Neighbouring steps on each side that the comparison looks at. */
const REACH = 2;

/**
 * For values sampled along a continuous path, which steps jump: step i (between points i and
 * i + 1) jumps when |v[i+1] − v[i]| is more than 8 times the median of the (up to four) steps
 * around it and more than 1e-3 of the values' size. A step next to a non-finite value is not
 * called a jump (the points say so).
 *
 * Local, not global: z^(½+i) on the unit circle changes its modulus by e^{−2π} = 1/535 over
 * the turn, so its steps differ by that factor from one end to the other while each is close
 * to its neighbours; a global median called the large steps jumps. A real jump stands out
 * from its neighbours: with 65 samples on a circle of radius 1 around 0, √z moves ~0.1 per
 * step and jumps by 2 across its cut; log moves ~0.1 and jumps by 2π. A single point on the
 * wrong side makes two jumping steps in a row; the median of four neighbours still sees them.
 */
export function detectJumps(values: readonly ComplexDouble[]): boolean[] {
  const steps: number[] = [];
  for (let i = 0; i + 1 < values.length; i += 1) {
    const a = values[i]!;
    const b = values[i + 1]!;
    steps.push([...a, ...b].every(Number.isFinite) ? Math.hypot(b[0] - a[0], b[1] - a[1]) : NaN);
  }
  return steps.map((s, i) => {
    if (Number.isNaN(s)) return false;
    const around: number[] = [];
    for (let j = i - REACH; j <= i + REACH; j += 1) if (j !== i && j >= 0 && j < steps.length && !Number.isNaN(steps[j]!)) around.push(steps[j]!);
    around.sort((x, y) => x - y);
    const m = around.length;
    const median = m === 0 ? 0 : m % 2 === 1 ? around[(m - 1) / 2]! : (around[m / 2 - 1]! + around[m / 2]!) / 2;
    const size = Math.max(Math.hypot(...values[i]!), Math.hypot(...values[i + 1]!));
    return s > NEIGHBOUR_FACTOR * median && s > SIZE_FRACTION * size;
  });
}
