import { BigComplex } from '../complex/big-complex';
import { Rational } from '../numbers/rational';

/** An exact complex rational a + bi (a, b ∈ ℚ): the coefficient field of g's polynomials. */
export class GaussianRational {
  constructor(
    readonly re: Rational,
    readonly im: Rational = Rational.ZERO,
  ) {}

  static readonly ZERO = new GaussianRational(Rational.ZERO);
  static readonly ONE = new GaussianRational(Rational.ONE);

  isZero(): boolean {
    return this.re.isZero() && this.im.isZero();
  }

  equals(b: GaussianRational): boolean {
    return this.re.compare(b.re) === 0 && this.im.compare(b.im) === 0;
  }

  add(b: GaussianRational): GaussianRational {
    return new GaussianRational(this.re.add(b.re), this.im.add(b.im));
  }

  sub(b: GaussianRational): GaussianRational {
    return new GaussianRational(this.re.sub(b.re), this.im.sub(b.im));
  }

  mul(b: GaussianRational): GaussianRational {
    return new GaussianRational(this.re.mul(b.re).sub(this.im.mul(b.im)), this.re.mul(b.im).add(this.im.mul(b.re)));
  }

  div(b: GaussianRational): GaussianRational {
    const n = b.re.mul(b.re).add(b.im.mul(b.im));
    const p = this.mul(new GaussianRational(b.re, b.im.negate()));
    return new GaussianRational(p.re.div(n), p.im.div(n));
  }

  negate(): GaussianRational {
    return new GaussianRational(this.re.negate(), this.im.negate());
  }

  toBigComplex(bits: number): BigComplex {
    return new BigComplex(this.re.toBigFloat(bits), this.im.toBigFloat(bits));
  }

  toDoubles(): [number, number] {
    return [Number(this.re.num) / Number(this.re.den), Number(this.im.num) / Number(this.im.den)];
  }
}
