import { BigComplex } from '../../reference/complex/big-complex';
import { exp } from '../../reference/functions/exp';
import { BigFloat } from '../../reference/numbers/big-float';
import { FixedTables } from '../../reference/real/fixed-tables';
import type { RegularBranch } from './regular-branch';
import { REGULAR_TUNING } from './regular-tuning';

const BITS = REGULAR_TUNING.bits;

/** e^{2πiνk} at working precision, the factor taking the principal sheet to sheet k. */
export function sheetFactor(branch: Pick<RegularBranch, 'nu' | 'factors'>, k: number): BigComplex {
  const known = branch.factors.get(k);
  if (known) return known;
  const twoPi = BigFloat.fromBigInt(FixedTables.pi(BITS + 8), 1 - (BITS + 8));
  const angle = twoPi.mul(BigFloat.fromBigInt(BigInt(k)));
  const arg = new BigComplex(
    angle.mul(branch.nu.im.toBigFloat(BITS + 8)).negate(),
    angle.mul(branch.nu.re.toBigFloat(BITS + 8)),
  );
  const f = exp.evaluate(arg, BITS).toComplex();
  // cos and sin of a rational multiple of 2π are either 0 exactly or far above 2^−176 of the
  // modulus; below that a part is rounding noise (sin π ≈ 1e−58) and would leave a tiny
  // non-zero part in a value that is purely real or imaginary.
  const top = Math.max(f.re.exponent(), f.im.exponent());
  const noise = (x: BigFloat) => x.isFinite() && !x.isZero() && x.exponent() < top - (BITS - 16);
  const settled = new BigComplex(noise(f.re) ? BigFloat.ZERO : f.re, noise(f.im) ? BigFloat.ZERO : f.im);
  branch.factors.set(k, settled);
  return settled;
}
