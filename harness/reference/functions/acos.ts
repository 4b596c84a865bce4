import { Approximation } from '../complex/approximation';
import { BigComplex } from '../complex/big-complex';
import { complexSqrt } from '../complex/complex-sqrt';
import { SpecialValue } from '../complex/special-value';
import { withSymmetry } from '../complex/with-symmetry';
import { BigFloat } from '../numbers/big-float';
import { realAsinh } from '../real/real-asinh';
import { realAtan2 } from '../real/real-atan2';
import type { CatalogueFunction } from './catalogue-function';

/**
 * Principal inverse cosine acos z = π/2 − asin z (DLMF 4.23.22), by Kahan's formulas:
 * with s1 = √(1 − z), s2 = √(1 + z), Re = 2 atan2(Re s1, Re s2), Im = asinh(Im(conj(s2)·s1)).
 *
 * - Range: 0 ≤ Re ≤ π.
 * - Cuts: (−∞, −1] and [1, +∞); branch points ±1.
 * - signed-zero (ISO/IEC 9899:2011 G.6.1.1): the sign of Im z picks the side,
 *   acos(2 ± 0i) = 0 ∓ 1.3170i; conjugate symmetric; cacos(±0 + i0) = π/2 − i0.
 * - counter-clockwise (Kahan): (−∞, −1] belongs to the upper side, [1, ∞) to the lower,
 *   acos 2 = 0 + 1.3170i. They differ at x + 0i, x > 1 and x − 0i, x < −1.
 */
export const acos: CatalogueFunction = {
  name: 'acos',
  cuts: [
    { axis: 'real', from: -Infinity, to: -1, ccwSide: 'upper' },
    { axis: 'real', from: 1, to: Infinity, ccwSide: 'lower' },
  ],
  special(z) {
    if (z.isFinite()) return null;
    return withSymmetry(z, false, table);
  },
  evaluate(z, bits) {
    const w = bits + 16;
    const s1 = complexSqrt(new BigComplex(BigFloat.ONE.sub(z.re), z.im.negate()), w);
    const s2 = complexSqrt(new BigComplex(BigFloat.ONE.add(z.re), z.im), w);
    const re = realAtan2(s1.re, s2.re, w).scale(1);
    const im = realAsinh(s2.re.mul(s1.im).sub(s2.im.mul(s1.re)), w);
    return Approximation.relative(re, im, bits);
  },
};

/** G.6.1.1 for Im z ≥ +0 (or NaN). */
function table(z: BigComplex): SpecialValue {
  const { re: x, im: y } = z;
  const nan = SpecialValue.of(BigFloat.NAN, BigFloat.NAN);
  if (y.isInfinite()) {
    if (x.isNaN()) return SpecialValue.of(BigFloat.NAN, BigFloat.NEG_INF);
    if (!x.isInfinite()) return SpecialValue.of(2, BigFloat.NEG_INF);
    return SpecialValue.of(x.signbit() ? 3 : 1, BigFloat.NEG_INF);
  }
  if (x.isNaN()) return nan;
  if (y.isNaN()) {
    if (x.isZero()) return SpecialValue.of(2, BigFloat.NAN);
    // G.6.1.1: cacos(±∞ + iNaN) = NaN ± i∞, sign unspecified; +∞ chosen.
    return x.isInfinite() ? SpecialValue.of(BigFloat.NAN, BigFloat.INF) : nan;
  }
  return SpecialValue.of(x.signbit() ? 4 : BigFloat.ZERO, BigFloat.NEG_INF);
}
