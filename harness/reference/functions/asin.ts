import { Approximation } from '../complex/approximation';
import { kahanAsin } from '../complex/kahan-asin';
import { asinh } from './asinh';
import type { CatalogueFunction } from './catalogue-function';

/**
 * Principal inverse sine asin z = −i ln(iz + √(1 − z²)) (DLMF 4.23.19), by Kahan's formulas.
 *
 * - Range: −π/2 ≤ Re ≤ π/2.
 * - Cuts: (−∞, −1] and [1, +∞) on the real axis; branch points ±1.
 * - signed-zero (ISO/IEC 9899:2011 G.6: casin z = −i casinh(iz)): on a cut the sign of Im z
 *   picks the side, asin(2 ± 0i) = π/2 ± 1.3170i; odd and conjugate symmetric.
 * - counter-clockwise (Kahan): (−∞, −1] belongs to the upper side (quadrant II), [1, ∞) to
 *   the lower side (quadrant IV), asin 2 = π/2 − 1.3170i. They differ at x + 0i, x > 1 and
 *   x − 0i, x < −1.
 */
export const asin: CatalogueFunction = {
  name: 'asin',
  cuts: [
    { axis: 'real', from: -Infinity, to: -1, ccwSide: 'upper' },
    { axis: 'real', from: 1, to: Infinity, ccwSide: 'lower' },
  ],
  special(z) {
    return asinh.special(z.mulI())?.mulMinusI() ?? null;
  },
  evaluate(z, bits) {
    const r = kahanAsin(z, bits + 8);
    return Approximation.relative(r.re, r.im, bits);
  },
};
