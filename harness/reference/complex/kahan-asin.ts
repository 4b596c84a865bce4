import { BigFloat } from '../numbers/big-float';
import { realAsinh } from '../real/real-asinh';
import { realAtan2 } from '../real/real-atan2';
import { BigComplex } from './big-complex';
import { complexSqrt } from './complex-sqrt';

/**
 * asin z for finite z by Kahan's formulas ("Branch cuts for complex elementary
 * functions", 1987): with s1 = √(1 − z) and s2 = √(1 + z) (principal roots; 1 ∓ z
 * formed exactly with the real 1, so Im(1 − z) = −y keeps its zero sign),
 * asin z = atan(x / Re(s1·s2)) + i·asinh(Im(conj(s1)·s2)).
 * Re(s1·s2) = ac − bd and Im(conj s1 · s2) = ad − bc add terms of one sign (b and d
 * have opposite signs when y ≠ 0, and are zero otherwise), so each part is as
 * accurate as the square roots; Re(s1·s2) ≥ +0, so atan(x/r) is atan2(x, r).
 */
export function kahanAsin(z: BigComplex, bits: number): BigComplex {
  const w = bits + 8;
  const s1 = complexSqrt(new BigComplex(BigFloat.ONE.sub(z.re), z.im.negate()), w);
  const s2 = complexSqrt(new BigComplex(BigFloat.ONE.add(z.re), z.im), w);
  const r = s1.re.mul(s2.re).sub(s1.im.mul(s2.im));
  const v = s1.re.mul(s2.im).sub(s1.im.mul(s2.re));
  return new BigComplex(realAtan2(z.re, r, w), realAsinh(v, w));
}
