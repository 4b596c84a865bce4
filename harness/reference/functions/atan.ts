import { Approximation } from '../complex/approximation';
import { kahanAtanh } from '../complex/kahan-atanh';
import { atanh } from './atanh';
import type { CatalogueFunction } from './catalogue-function';

/**
 * Principal inverse tangent atan z = (i/2) ln((i + z)/(i − z)) (DLMF 4.23.26), as −i·atanh(iz)
 * (ISO/IEC 9899:2011 G.6: catan z = −i catanh(iz)).
 *
 * - Range: −π/2 ≤ Re ≤ π/2.
 * - Cuts: [i, +i∞) and (−i∞, −i] on the imaginary axis; branch points ±i (logarithmic poles).
 * - signed-zero: the sign of Re z picks the side, atan(±0 + 2i) = ±π/2 + 0.5493i; odd and
 *   conjugate symmetric.
 * - counter-clockwise (Kahan): [i, i∞) belongs to the right side (quadrant I), (−i∞, −i] to
 *   the left (quadrant III), atan(2i) = π/2 + 0.5493i. They differ at −0 + iy, y > 1 and
 *   +0 + iy, y < −1.
 */
export const atan: CatalogueFunction = {
  name: 'atan',
  cuts: [
    { axis: 'imaginary', from: 1, to: Infinity, ccwSide: 'right' },
    { axis: 'imaginary', from: -Infinity, to: -1, ccwSide: 'left' },
  ],
  special(z) {
    return atanh.special(z.mulI())?.mulMinusI() ?? null;
  },
  evaluate(z, bits) {
    const r = kahanAtanh(z.mulI(), bits + 8).mulMinusI();
    return Approximation.relative(r.re, r.im, bits);
  },
};
