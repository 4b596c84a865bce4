import type { BigFloat } from '../numbers/big-float';

/**
 * A computed complex value with a bound on the error of each part:
 * |error of re| ≤ 2^reErr and |error of im| ≤ 2^imErr; −Infinity means exact.
 * Rounding to binary64 or to decimal digits is decided from these bounds.
 */
export class Approximation {
  constructor(
    readonly re: BigFloat,
    readonly im: BigFloat,
    readonly reErr: number,
    readonly imErr: number,
  ) {}

  /** Parts each with relative error below 2^−bits; zeros are taken as exact. */
  static relative(re: BigFloat, im: BigFloat, bits: number): Approximation {
    return new Approximation(re, im, errorOf(re, bits), errorOf(im, bits));
  }
}

function errorOf(c: BigFloat, bits: number): number {
  if (!c.isFinite() || c.isZero()) return -Infinity;
  return c.exponent() - bits;
}
