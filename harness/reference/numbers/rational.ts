import { BigFloat } from './big-float';

function gcd(a: bigint, b: bigint): bigint {
  let x = a < 0n ? -a : a;
  let y = b < 0n ? -b : b;
  while (y !== 0n) [x, y] = [y, x % y];
  return x;
}

/**
 * An exact rational number num/den in lowest terms (den > 0).
 *
 * Used where docs/suite-format.md says a value is exact: an exponent written "1/3", and
 * z0, f0, ν and path geometry of `continue`, where "0.1" means one tenth and not
 * the double nearest to it.
 */
export class Rational {
  readonly num: bigint;
  readonly den: bigint;

  constructor(num: bigint, den = 1n) {
    if (den === 0n) throw new RangeError('zero denominator');
    const g = gcd(num, den) || 1n;
    const sign = den < 0n ? -1n : 1n;
    this.num = (sign * num) / g;
    this.den = (sign * den) / g;
  }

  static readonly ZERO = new Rational(0n);
  static readonly ONE = new Rational(1n);

  /** The exact rational value of a finite double. */
  static fromDouble(x: number): Rational {
    return Rational.fromBigFloat(BigFloat.fromDouble(x));
  }

  /** The exact rational value of a finite BigFloat. */
  static fromBigFloat(b: BigFloat): Rational {
    if (!b.isFinite()) throw new RangeError('not a finite number');
    const m = b.neg ? -b.m : b.m;
    return b.e >= 0 ? new Rational(m << BigInt(b.e)) : new Rational(m, 1n << BigInt(-b.e));
  }

  isZero(): boolean {
    return this.num === 0n;
  }

  isInteger(): boolean {
    return this.den === 1n;
  }

  add(b: Rational): Rational {
    return new Rational(this.num * b.den + b.num * this.den, this.den * b.den);
  }

  sub(b: Rational): Rational {
    return new Rational(this.num * b.den - b.num * this.den, this.den * b.den);
  }

  mul(b: Rational): Rational {
    return new Rational(this.num * b.num, this.den * b.den);
  }

  div(b: Rational): Rational {
    return new Rational(this.num * b.den, this.den * b.num);
  }

  negate(): Rational {
    return new Rational(-this.num, this.den);
  }

  compare(b: Rational): number {
    const d = this.num * b.den - b.num * this.den;
    return d < 0n ? -1 : d > 0n ? 1 : 0;
  }

  /** Exact when the denominator is a power of two, else truncated to `bits` bits. */
  toBigFloat(bits: number): BigFloat {
    const n = BigFloat.fromBigInt(this.num);
    if (this.den === 1n) return n;
    if ((this.den & (this.den - 1n)) === 0n) return n.scale(-(this.den.toString(2).length - 1));
    return n.div(BigFloat.fromBigInt(this.den), bits);
  }

  toString(): string {
    return this.den === 1n ? this.num.toString() : `${this.num}/${this.den}`;
  }
}
