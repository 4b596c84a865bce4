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
  const n = values.length;
  const re = new Float64Array(n);
  const im = new Float64Array(n);
  values.forEach((v, i) => {
    re[i] = v[0];
    im[i] = v[1];
  });
  return Array.from(detectJumpsInColumns(re, im), (j) => j === 1);
}

/** |x + iy|: the plain formula where it neither overflows nor underflows, Math.hypot (5–10× slower here) where it might. */
function modulus(x: number, y: number): number {
  const s = x * x + y * y;
  return s > 1e-290 && s < 1e290 ? Math.sqrt(s) : Math.hypot(x, y);
}

/**
 * detectJumps on values held column-wise (re and im arrays, NaN for a missing value), without
 * allocating per point: the runner's check loop calls it on paths of 100,000 points.
 * Returns 1 for a step that jumps, 0 otherwise.
 */
export function detectJumpsInColumns(re: Float64Array, im: Float64Array): Uint8Array {
  const n = re.length;
  const m = Math.max(0, n - 1);
  const steps = new Float64Array(m);
  for (let i = 0; i < m; i++) {
    const a = re[i] as number;
    const b = im[i] as number;
    const c = re[i + 1] as number;
    const d = im[i + 1] as number;
    steps[i] = a - a === 0 && b - b === 0 && c - c === 0 && d - d === 0 ? modulus(c - a, d - b) : NaN;
  }
  const out = new Uint8Array(m);
  const around = new Float64Array(2 * REACH);
  for (let i = 0; i < m; i++) {
    const s = steps[i] as number;
    if (s !== s) continue;
    // Most steps are far below 1e-3 of the values' size: decided without the neighbours.
    const size = Math.max(modulus(re[i] as number, im[i] as number), modulus(re[i + 1] as number, im[i + 1] as number));
    if (!(s > SIZE_FRACTION * size)) continue;
    let k = 0;
    for (let j = i - REACH; j <= i + REACH; j++) {
      if (j === i || j < 0 || j >= m) continue;
      const x = steps[j] as number;
      if (x === x) around[k++] = x;
    }
    // Insertion sort of at most four values.
    for (let p = 1; p < k; p++) {
      const x = around[p] as number;
      let q = p - 1;
      while (q >= 0 && (around[q] as number) > x) {
        around[q + 1] = around[q] as number;
        q--;
      }
      around[q + 1] = x;
    }
    const median =
      k === 0
        ? 0
        : k % 2 === 1
          ? (around[(k - 1) / 2] as number)
          : ((around[k / 2 - 1] as number) + (around[k / 2] as number)) / 2;
    if (s > NEIGHBOUR_FACTOR * median) out[i] = 1;
  }
  return out;
}
