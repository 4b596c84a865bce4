import { BigFloat } from '../numbers/big-float';
import { BigComplex } from './big-complex';

/**
 * Principal square root of a finite z, each part with relative error below 2^−bits.
 * t = √((|x| + |z|)/2); x ≥ +0 gives t + i·y/(2t), x ≤ −0 gives |y|/(2t) + i·copysign(t, y);
 * both sums are of non-negative terms, and a zero y gives an exact zero part with y's sign
 * (ISO/IEC 9899:2011 G.6.4.2: csqrt(±0 ± i0) = +0 ± i0).
 */
export function complexSqrt(z: BigComplex, bits: number): BigComplex {
  const { re: x, im: y } = z;
  if (x.isZero() && y.isZero()) return new BigComplex(BigFloat.ZERO, y);
  const w = bits + 4;
  const modulus = z.norm().sqrt(w);
  const t = x.abs().add(modulus).scale(-1).sqrt(w);
  const other = y.abs().div(t.scale(1), w);
  if (!x.signbit()) return new BigComplex(t, other.withSign(y.signbit()));
  return new BigComplex(other, t.withSign(y.signbit()));
}
