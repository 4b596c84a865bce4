/** The functions the reference bench mixes, in the order its points cycle through them. */
const FUNCTIONS = ['sqrt', 'exp', 'log', 'asin', 'acos', 'atan', 'asinh', 'acosh', 'atanh'];

/** One point of the reference bench: a function and the double x + iy it is evaluated at. */
export interface BenchPoint {
  fn: string;
  x: number;
  y: number;
}

/**
 * The reference bench's points: `count` points cycling through its nine functions, each part
 * uniform in [−4, 4) from the Lehmer generator (multiplier 16807, modulus 2^31 − 1) with `seed`.
 * Shared by `npm run bench:reference` and the test that the fast tier answers them bit for bit as
 * the bigint engine does, so the bench measures only points that test has checked.
 */
export function benchReferencePoints(count: number, seed: number): BenchPoint[] {
  let s = seed;
  const random = () => {
    s = (s * 16807) % 2147483647;
    return s / 2147483647;
  };
  return Array.from({ length: count }, (_, i) => ({
    fn: FUNCTIONS[i % FUNCTIONS.length] as string,
    x: (random() - 0.5) * 8,
    y: (random() - 0.5) * 8,
  }));
}
