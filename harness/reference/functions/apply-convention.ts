import type { Convention } from '../../../shared/schemas/convention-schema';
import { BigComplex } from '../complex/big-complex';
import { BigFloat } from '../numbers/big-float';
import type { Cut } from './cut';

/**
 * The input a function sees under a convention. `signed-zero` passes z through: the
 * sign of a zero part already names a side. `counter-clockwise` ignores zero signs
 * (both become +0) and then, for a z lying on one of `cuts`, gives the zero part the
 * sign of the side Kahan's rule names, so the signed-zero evaluation returns that side's limit.
 * The finite end (a branch point, where the value is the same from both sides or infinite)
 * is left with +0.
 */
export function applyConvention(z: BigComplex, cuts: readonly Cut[], convention: Convention): BigComplex {
  if (convention === 'signed-zero') return z;
  let re = z.re.isZero() ? BigFloat.ZERO : z.re;
  let im = z.im.isZero() ? BigFloat.ZERO : z.im;
  if (!z.isFinite()) return new BigComplex(re, im);
  for (const cut of cuts) {
    const along = cut.axis === 'real' ? re : im;
    const across = cut.axis === 'real' ? im : re;
    if (!across.isZero()) continue;
    const inside =
      (cut.from === -Infinity || along.compare(BigFloat.fromDouble(cut.from)) > 0) &&
      (cut.to === Infinity || along.compare(BigFloat.fromDouble(cut.to)) < 0);
    if (!inside) continue;
    const negative = cut.ccwSide === 'lower' || cut.ccwSide === 'left';
    if (cut.axis === 'real') im = BigFloat.zero(negative);
    else re = BigFloat.zero(negative);
  }
  return new BigComplex(re, im);
}
