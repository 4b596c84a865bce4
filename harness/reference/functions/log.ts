import { Approximation } from '../complex/approximation';
import type { BigComplex } from '../complex/big-complex';
import { SpecialValue } from '../complex/special-value';
import { withSymmetry } from '../complex/with-symmetry';
import { BigFloat } from '../numbers/big-float';
import { realAtan2 } from '../real/real-atan2';
import { realLog } from '../real/real-log';
import type { CatalogueFunction } from './catalogue-function';

/**
 * Principal logarithm Log z = ln|z| + i·Arg z (DLMF 4.2.5; 4.2.7 on the cut).
 *
 * - Range: −π < Im ≤ π under counter-clockwise; −π ≤ Im ≤ π under signed-zero.
 * - Cut: (−∞, 0]; branch point 0 (a logarithmic singularity).
 * - signed-zero (ISO/IEC 9899:2011 G.6.3.2): Log(x ± 0i) = ln|x| ± iπ for x < 0;
 *   clog(−0 + i0) = −∞ + iπ, clog(+0 + i0) = −∞ + i0; conjugate symmetric.
 * - counter-clockwise (Kahan): the cut belongs to the upper side, Log(−1) = iπ. The
 *   conventions differ at x − 0i for x ≤ 0.
 *
 * ln|z| is ½ ln(x² + y²) with x² + y² formed exactly, so |z| near 1 loses nothing.
 */
export const log: CatalogueFunction = {
  name: 'log',
  cuts: [{ axis: 'real', from: -Infinity, to: 0, ccwSide: 'upper' }],
  special(z) {
    if (z.isZero()) {
      return SpecialValue.of(BigFloat.NEG_INF, z.re.signbit() ? (z.im.signbit() ? -4 : 4) : z.im);
    }
    if (z.isFinite()) return null;
    return withSymmetry(z, false, table);
  },
  evaluate(z, bits) {
    const w = bits + 8;
    const re = realLog(z.norm(), w).scale(-1);
    const im = realAtan2(z.im, z.re, w);
    return Approximation.relative(re, im, bits);
  },
};

/** G.6.3.2 for Im z ≥ +0 (or NaN). */
function table(z: BigComplex): SpecialValue {
  const { re: x, im: y } = z;
  if (x.isNaN()) return SpecialValue.of(y.isInfinite() ? BigFloat.INF : BigFloat.NAN, BigFloat.NAN);
  if (y.isNaN()) return SpecialValue.of(x.isInfinite() ? BigFloat.INF : BigFloat.NAN, BigFloat.NAN);
  if (y.isInfinite()) {
    if (!x.isInfinite()) return SpecialValue.of(BigFloat.INF, 2);
    return SpecialValue.of(BigFloat.INF, x.signbit() ? 3 : 1);
  }
  return SpecialValue.of(BigFloat.INF, x.signbit() ? 4 : BigFloat.ZERO);
}
