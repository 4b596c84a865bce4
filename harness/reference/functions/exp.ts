import { Approximation } from '../complex/approximation';
import type { BigComplex } from '../complex/big-complex';
import { SpecialValue } from '../complex/special-value';
import { withSymmetry } from '../complex/with-symmetry';
import { BigFloat } from '../numbers/big-float';
import { realExp } from '../real/real-exp';
import { realSinCos } from '../real/real-sin-cos';
import type { CatalogueFunction } from './catalogue-function';

/**
 * Exponential e^z = e^x (cos y + i sin y) (DLMF 4.2.19, 4.14.*). Single-valued: no cuts,
 * so the two conventions agree except that counter-clockwise ignores the sign of a zero
 * Im z (e^(x − 0i) = e^x + 0i there, e^x − 0i under signed-zero, ISO/IEC 9899:2011 G.6.3.1).
 */
export const exp: CatalogueFunction = {
  name: 'exp',
  cuts: [],
  special(z) {
    if (z.isFinite()) return null;
    return withSymmetry(z, false, table);
  },
  evaluate(z, bits) {
    const w = bits + 8;
    const m = realExp(z.re, w);
    // e^(x ± 0i) is real: its imaginary part is exactly e^x · sin(±0) = ±0, even where e^x
    // overflows binary64 (G.6.3.1 gives cexp(+∞ ± i0) = +∞ ± i0; the finite case follows by
    // conjugate symmetry and e^x > 0). Forming e^x · sin(0) would give ∞ · 0 = NaN there.
    if (z.im.isZero()) return new Approximation(m, z.im, m.exponent() - bits, -Infinity);
    const [s, c] = realSinCos(z.im, w);
    return Approximation.relative(m.mul(c), m.mul(s), bits);
  },
};

/** G.6.3.1 for Im z ≥ +0 (or NaN). */
function table(z: BigComplex): SpecialValue {
  const { re: x, im: y } = z;
  const nan = SpecialValue.of(BigFloat.NAN, BigFloat.NAN);
  if (x.isNaN()) return y.isZero() ? SpecialValue.of(BigFloat.NAN, y) : nan;
  if (y.isNaN() || y.isInfinite()) {
    if (!x.isInfinite()) return nan;
    // G.6.3.1: cexp(−∞ ± i∞ or iNaN) = ±0 ± i0 and cexp(+∞ ± i∞ or iNaN) = ±∞ + iNaN,
    // signs unspecified; +0 + i0 and +∞ + iNaN chosen.
    return x.signbit() ? SpecialValue.of(BigFloat.ZERO, BigFloat.ZERO) : SpecialValue.of(BigFloat.INF, BigFloat.NAN);
  }
  // x = ±∞, y finite: +0·cis(y) or +∞·cis(y), the signs those of cos y and sin y.
  if (y.isZero()) return SpecialValue.of(x.signbit() ? BigFloat.ZERO : BigFloat.INF, y);
  const [s, c] = realSinCos(y, 16);
  const mag = x.signbit() ? BigFloat.ZERO : BigFloat.INF;
  return SpecialValue.of(mag.withSign(c.signbit()), mag.withSign(s.signbit()));
}
