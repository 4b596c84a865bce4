/**
 * The rows the cmath checks run over: the functions cmath has, the special and ordinary values
 * combined for real and imaginary parts, the ulps allowed (cmath is faithful, not correctly rounded:
 * finite non-special values may differ by an ulp or two), and points on every cut.
 */
export const CMATH_CASES = {
  functions: ['sqrt', 'exp', 'log', 'asin', 'acos', 'atan', 'asinh', 'acosh', 'atanh'] as const,
  special: [0, -0, 1, -1, 2.5, -2.5, Infinity, -Infinity, NaN],
  ulps: 2,
  /** Points on every cut; both zero signs across it are added by cutPointsOf. */
  cuts: {
    sqrt: [
      [-4, 0],
      [-0.5, 0],
      [-1e300, 0],
      [-5e-324, 0],
      [-2.5, 0],
    ],
    log: [
      [-4, 0],
      [-0.5, 0],
      [-1e300, 0],
      [-5e-324, 0],
      [-1, 0],
    ],
    asin: [
      [2, 0],
      [-2, 0],
      [1.5, 0],
      [-1e10, 0],
      [1e300, 0],
      [1 + 2 ** -52, 0],
    ],
    acos: [
      [2, 0],
      [-2, 0],
      [1.5, 0],
      [-1e10, 0],
      [1e300, 0],
      [-1 - 2 ** -52, 0],
    ],
    atanh: [
      [2, 0],
      [-2, 0],
      [1.5, 0],
      [-1e10, 0],
      [1e300, 0],
      [1 + 2 ** -52, 0],
    ],
    acosh: [
      [0.5, 0],
      [-0.5, 0],
      [-2, 0],
      [-1e300, 0],
      [1 - 2 ** -53, 0],
      [-1, 0],
    ],
    asinh: [
      [0, 2],
      [0, -2],
      [0, 1.5],
      [0, -1e10],
      [0, 1e300],
      [0, 1 + 2 ** -52],
    ],
    atan: [
      [0, 2],
      [0, -2],
      [0, 1.5],
      [0, -1e10],
      [0, 1e300],
      [0, -1 - 2 ** -52],
    ],
  } as Record<string, [number, number][]>,
};
