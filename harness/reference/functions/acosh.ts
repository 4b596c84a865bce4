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
 * Principal inverse hyperbolic cosine acosh z = ln(z + (z + 1)√((z − 1)/(z + 1))) (DLMF 4.37.17),
 * by Kahan's formulas: s1 = √(z − 1), s2 = √(z + 1),
 * Re = asinh(Re(conj(s1)·s2)), Im = 2 atan2(Im s1, Re s2).
 *
 * - Range: Re ≥ 0, −π ≤ Im ≤ π.
 * - Cut: (−∞, 1] on the real axis; branch points 1 and −1 (both on the cut).
 * - signed-zero (ISO/IEC 9899:2011 G.6.2.1): the sign of Im z picks the side,
 *   acosh(−2 ± 0i) = 1.3170 ± iπ; conjugate symmetric; cacosh(±0 + i0) = +0 + iπ/2.
 * - counter-clockwise (Kahan): the cut belongs to the upper side, acosh(−2) = 1.3170 + iπ,
 *   acosh(0) = iπ/2. They differ at x − 0i, x < 1.
 */
export const acosh: CatalogueFunction = {
  name: 'acosh',
  cuts: [{ axis: 'real', from: -Infinity, to: 1, ccwSide: 'upper' }],
  special(z) {
    if (z.isFinite()) return null;
    return withSymmetry(z, false, table);
  },
  evaluate(z, bits) {
    const w = bits + 16;
    const s1 = complexSqrt(new BigComplex(z.re.sub(BigFloat.ONE), z.im), w);
    const s2 = complexSqrt(new BigComplex(z.re.add(BigFloat.ONE), z.im), w);
    const re = realAsinh(s1.re.mul(s2.re).add(s1.im.mul(s2.im)), w);
    const im = realAtan2(s1.im, s2.re, w).scale(1);
    return Approximation.relative(re, im, bits);
  },
};

/** G.6.2.1 for Im z ≥ +0 (or NaN). */
function table(z: BigComplex): SpecialValue {
  const { re: x, im: y } = z;
  if (y.isInfinite()) {
    if (x.isNaN()) return SpecialValue.of(BigFloat.INF, BigFloat.NAN);
    if (!x.isInfinite()) return SpecialValue.of(BigFloat.INF, 2);
    return SpecialValue.of(BigFloat.INF, x.signbit() ? 3 : 1);
  }
  if (x.isNaN()) return SpecialValue.of(BigFloat.NAN, BigFloat.NAN);
  if (y.isNaN()) return SpecialValue.of(x.isInfinite() ? BigFloat.INF : BigFloat.NAN, BigFloat.NAN);
  return SpecialValue.of(BigFloat.INF, x.signbit() ? 4 : BigFloat.ZERO);
}
