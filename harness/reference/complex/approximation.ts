import { BigFloat } from '../numbers/big-float';
import { BigComplex } from './big-complex';

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

  /** The value, without its bounds. */
  toComplex(): BigComplex {
    return new BigComplex(this.re, this.im);
  }

  /**
   * The finer of two evaluations at different precisions, with each part's bound raised to
   * twice their difference: a heuristic bound (Ziv's "two precisions agree"), used where
   * the input of a formula is itself rounded.
   */
  static agreement(coarse: Approximation, fine: Approximation): Approximation {
    return new Approximation(
      fine.re,
      fine.im,
      agree(coarse.re, fine.re, fine.reErr),
      agree(coarse.im, fine.im, fine.imErr),
    );
  }

  /**
   * Whether the bounds settle what is wanted: the rounding of each part to binary64 (the
   * interval value ± bound holds one double and one zero sign), and `bits` correct leading bits.
   */
  decided(double: boolean, bits: number): boolean {
    return (
      (!double || (doubleDecided(this.re, this.reErr) && doubleDecided(this.im, this.imErr))) &&
      bitsDecided(this.re, this.reErr, bits) &&
      bitsDecided(this.im, this.imErr, bits)
    );
  }
}

function agree(a: BigFloat, b: BigFloat, bErr: number): number {
  if (!a.isFinite() || !b.isFinite()) return Object.is(a.toDouble(), b.toDouble()) ? bErr : Infinity;
  if (a.isZero() && b.isZero()) return a.signbit() === b.signbit() ? bErr : Infinity;
  const d = a.sub(b);
  return Math.max(bErr, d.isZero() ? -Infinity : d.exponent() + 1);
}

function doubleDecided(c: BigFloat, err: number): boolean {
  if (err === -Infinity || !c.isFinite()) return true;
  if (err === Infinity) return false;
  const e = BigFloat.of(false, 1n, Math.ceil(err));
  return Object.is(c.sub(e).toDouble(), c.add(e).toDouble());
}

function bitsDecided(c: BigFloat, err: number, bits: number): boolean {
  if (bits === 0 || err === -Infinity || !c.isFinite()) return true;
  if (c.isZero() || err === Infinity) return false;
  return c.exponent() - err >= bits;
}

function errorOf(c: BigFloat, bits: number): number {
  if (!c.isFinite() || c.isZero()) return -Infinity;
  return c.exponent() - bits;
}
