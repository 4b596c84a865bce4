import { Approximation } from '../complex/approximation';
import type { BigComplex } from '../complex/big-complex';
import { complexSqrt } from '../complex/complex-sqrt';
import { SpecialValue } from '../complex/special-value';
import { withSymmetry } from '../complex/with-symmetry';
import { BigFloat } from '../numbers/big-float';
import type { CatalogueFunction } from './catalogue-function';

/**
 * Principal square root √z = exp(½ Log z) (DLMF §4.2(iv), with 4.2.7 on the cut).
 *
 * - Range: Re √z ≥ 0 (the right half-plane with the imaginary axis).
 * - Cut: (−∞, 0] on the real axis; branch point 0.
 * - signed-zero (ISO/IEC 9899:2011 G.6.4.2): on the cut the sign of Im z picks the side,
 *   √(−4 ± 0i) = 0 ± 2i; conjugate symmetric; csqrt(±0 ± i0) = +0 ± i0.
 * - counter-clockwise (Kahan): the cut belongs to the upper side, √(−4) = 2i whatever the
 *   zero's sign. The conventions differ only at x − 0i with x < 0.
 */
export const sqrt: CatalogueFunction = {
  name: 'sqrt',
  cuts: [{ axis: 'real', from: -Infinity, to: 0, ccwSide: 'upper' }],
  special(z) {
    if (z.isFinite()) return null;
    return withSymmetry(z, false, table);
  },
  evaluate(z, bits) {
    const r = complexSqrt(z, bits + 8);
    return Approximation.relative(r.re, r.im, bits);
  },
};

/** G.6.4.2 for Im z ≥ +0 (or NaN). */
function table(z: BigComplex): SpecialValue {
  const { re: x, im: y } = z;
  if (y.isInfinite()) return SpecialValue.of(BigFloat.INF, y);
  if (x.isNaN()) return SpecialValue.of(BigFloat.NAN, BigFloat.NAN);
  if (y.isNaN()) {
    if (x.isInfinite() && !x.signbit()) return SpecialValue.of(BigFloat.INF, BigFloat.NAN);
    // G.6.4.2: csqrt(−∞ + iNaN) = NaN ± i∞, sign of the imaginary part unspecified; +∞ chosen.
    if (x.isInfinite()) return SpecialValue.of(BigFloat.NAN, BigFloat.INF);
    return SpecialValue.of(BigFloat.NAN, BigFloat.NAN);
  }
  if (x.signbit()) return SpecialValue.of(BigFloat.ZERO, BigFloat.INF);
  return SpecialValue.of(BigFloat.INF, BigFloat.ZERO);
}
