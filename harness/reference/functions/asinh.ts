import { Approximation } from '../complex/approximation';
import type { BigComplex } from '../complex/big-complex';
import { kahanAsin } from '../complex/kahan-asin';
import { SpecialValue } from '../complex/special-value';
import { withSymmetry } from '../complex/with-symmetry';
import { BigFloat } from '../numbers/big-float';
import type { CatalogueFunction } from './catalogue-function';

/**
 * Principal inverse hyperbolic sine asinh z = ln(z + √(1 + z²)) (DLMF 4.37.16), computed as
 * i·asin(−iz) from Kahan's asin formulas (the identity of ISO/IEC 9899:2011 G.6 read backwards).
 *
 * - Range: |Im| ≤ π/2.
 * - Cuts: [i, +i∞) and (−i∞, −i] on the imaginary axis; branch points ±i.
 * - signed-zero (G.6.2.2): on a cut the sign of Re z picks the side; odd and conjugate symmetric.
 * - counter-clockwise (Kahan): [i, i∞) belongs to the right side (quadrant I), (−i∞, −i] to the
 *   left (quadrant III). They differ at −0 + iy, y > 1 and +0 + iy, y < −1.
 */
export const asinh: CatalogueFunction = {
  name: 'asinh',
  cuts: [
    { axis: 'imaginary', from: 1, to: Infinity, ccwSide: 'right' },
    { axis: 'imaginary', from: -Infinity, to: -1, ccwSide: 'left' },
  ],
  special(z) {
    if (z.isFinite()) return null;
    return withSymmetry(z, true, table);
  },
  evaluate(z, bits) {
    const r = kahanAsin(z.mulMinusI(), bits + 8).mulI();
    return Approximation.relative(r.re, r.im, bits);
  },
};

/** G.6.2.2 for Re z ≥ +0, Im z ≥ +0 (NaN parts unsigned). */
function table(z: BigComplex): SpecialValue {
  const { re: x, im: y } = z;
  const nan = SpecialValue.of(BigFloat.NAN, BigFloat.NAN);
  if (y.isInfinite()) {
    // G.6.2.2: casinh(NaN + i∞) = ±∞ + iNaN, sign unspecified; +∞ chosen.
    if (x.isNaN()) return SpecialValue.of(BigFloat.INF, BigFloat.NAN);
    return SpecialValue.of(BigFloat.INF, x.isInfinite() ? 1 : 2);
  }
  if (y.isNaN()) return x.isInfinite() ? SpecialValue.of(BigFloat.INF, BigFloat.NAN) : nan;
  if (x.isNaN()) return y.isZero() ? SpecialValue.of(BigFloat.NAN, y) : nan;
  return SpecialValue.of(BigFloat.INF, BigFloat.ZERO);
}
