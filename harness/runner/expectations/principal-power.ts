import { evaluateSubject } from '../../expressions/evaluate-subject';
import { BigComplex } from '../../reference/complex/big-complex';
import { BigFloat } from '../../reference/numbers/big-float';
import type { RegularBranch } from './regular-branch';

/**
 * The principal g(z)^ν at z, the P of every branch value C·P·e^{2πiνk}.
 *
 * One Ziv round (64 and 112 bits agreeing, ~2^−60 relative): asking for digits would escalate
 * to 8192 bits wherever a part is exactly zero (z^(½+i) at z = 1), since noise never settles.
 * The product is rounded once, so the double is right except within ~2^−7 ulp of a tie.
 * A part within its error bound of zero is zero: noise of the working precision (~1e-61 where
 * √(x² − 1) is purely imaginary) must not round to a tiny non-zero double.
 */
export function principalPower(branch: Pick<RegularBranch, 'gPow'>, z: BigComplex): BigComplex {
  const a = evaluateSubject(branch.gPow, z, 'signed-zero', { double: false, digits: 0 }).approximation;
  const settle = (x: BigFloat, err: number) =>
    x.isFinite() && !x.isZero() && err > -Infinity && x.exponent() <= err ? BigFloat.ZERO : x;
  return new BigComplex(settle(a.re, a.reErr), settle(a.im, a.imErr));
}
