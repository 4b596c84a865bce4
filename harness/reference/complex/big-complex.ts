import { BigFloat } from '../numbers/big-float';

/**
 * A complex number with {@link BigFloat} parts. Sums and products are exact and
 * follow IEEE 754 real arithmetic part by part, so zero signs come out as a C
 * program computing (a+bi)(c+di) = (ac − bd) + (ad + bc)i would get them.
 * Multiplying by ±i is the exact swap Annex G's identities mean (casin z = −i casinh(iz)).
 */
export class BigComplex {
  constructor(
    readonly re: BigFloat,
    readonly im: BigFloat,
  ) {}

  static fromDoubles(re: number, im: number): BigComplex {
    return new BigComplex(BigFloat.fromDouble(re), BigFloat.fromDouble(im));
  }

  isFinite(): boolean {
    return this.re.isFinite() && this.im.isFinite();
  }

  isZero(): boolean {
    return this.re.isZero() && this.im.isZero();
  }

  add(b: BigComplex): BigComplex {
    return new BigComplex(this.re.add(b.re), this.im.add(b.im));
  }

  sub(b: BigComplex): BigComplex {
    return new BigComplex(this.re.sub(b.re), this.im.sub(b.im));
  }

  mul(b: BigComplex): BigComplex {
    return new BigComplex(this.re.mul(b.re).sub(this.im.mul(b.im)), this.re.mul(b.im).add(this.im.mul(b.re)));
  }

  /** Product by a real number: both parts scaled, zero signs by IEEE rules. */
  mulReal(r: BigFloat): BigComplex {
    return new BigComplex(this.re.mul(r), this.im.mul(r));
  }

  /** i·z = −y + ix. */
  mulI(): BigComplex {
    return new BigComplex(this.im.negate(), this.re);
  }

  /** −i·z = y − ix. */
  mulMinusI(): BigComplex {
    return new BigComplex(this.im, this.re.negate());
  }

  negate(): BigComplex {
    return new BigComplex(this.re.negate(), this.im.negate());
  }

  conj(): BigComplex {
    return new BigComplex(this.re, this.im.negate());
  }

  /** x² + y², exact. */
  norm(): BigFloat {
    return this.re.mul(this.re).add(this.im.mul(this.im));
  }

  /**
   * 1/z = conj(z)/|z|², each part with relative error below 2^−bits; the parts keep
   * the zero signs of x/|z|² and −y/|z|². 1/(±0 ± 0i) is the infinity
   * (copysign(∞, x), copysign(∞, −y)), as IEEE division by a zero of that sign gives.
   */
  reciprocal(bits: number): BigComplex {
    if (this.isZero()) {
      return new BigComplex(BigFloat.infinity(this.re.signbit()), BigFloat.infinity(!this.im.signbit()));
    }
    const n = this.norm();
    return new BigComplex(this.re.div(n, bits), this.im.negate().div(n, bits));
  }

  truncate(bits: number): BigComplex {
    return new BigComplex(this.re.truncate(bits), this.im.truncate(bits));
  }
}
