import { Approximation } from '../complex/approximation';
import type { BigComplex } from '../complex/big-complex';
import { kahanAtanh } from '../complex/kahan-atanh';
import { SpecialValue } from '../complex/special-value';
import { withSymmetry } from '../complex/with-symmetry';
import { BigFloat } from '../numbers/big-float';
import type { CatalogueFunction } from './catalogue-function';

/**
 * Principal inverse hyperbolic tangent atanh z = ½ ln((1 + z)/(1 − z)) (DLMF 4.37.24).
 *
 * - Range: |Im| ≤ π/2.
 * - Cuts: (−∞, −1] and [1, +∞) on the real axis; branch points ±1 (logarithmic poles).
 * - signed-zero (ISO/IEC 9899:2011 G.6.2.3): the sign of Im z picks the side,
 *   atanh(2 ± 0i) = 0.5493 ± iπ/2; odd and conjugate symmetric; catanh(±1 ± i0) = ±∞ ± i0.
 * - counter-clockwise (Kahan): (−∞, −1] belongs to the upper side, [1, ∞) to the lower,
 *   atanh 2 = 0.5493 − iπ/2. They differ at x + 0i, x > 1 and x − 0i, x < −1.
 */
export const atanh: CatalogueFunction = {
  name: 'atanh',
  cuts: [
    { axis: 'real', from: -Infinity, to: -1, ccwSide: 'upper' },
    { axis: 'real', from: 1, to: Infinity, ccwSide: 'lower' },
  ],
  special(z) {
    return withSymmetry(z, true, table);
  },
  evaluate(z, bits) {
    const r = kahanAtanh(z, bits + 8);
    return Approximation.relative(r.re, r.im, bits);
  },
};

/** G.6.2.3 for Re z ≥ +0, Im z ≥ +0 (NaN parts unsigned); null where the formula applies. */
function table(z: BigComplex): SpecialValue | null {
  const { re: x, im: y } = z;
  if (z.isFinite()) {
    return x.compare(BigFloat.ONE) === 0 && y.isZero() ? SpecialValue.of(BigFloat.INF, y) : null;
  }
  if (y.isInfinite() || (x.isInfinite() && !y.isNaN())) {
    // G.6.2.3: catanh(NaN + i∞) = ±0 + iπ/2, sign unspecified; +0 chosen.
    return SpecialValue.of(BigFloat.ZERO, 2);
  }
  if (y.isNaN()) {
    if (x.isInfinite() || x.isZero()) return SpecialValue.of(BigFloat.ZERO, BigFloat.NAN);
    return SpecialValue.of(BigFloat.NAN, BigFloat.NAN);
  }
  return SpecialValue.of(BigFloat.NAN, BigFloat.NAN);
}
