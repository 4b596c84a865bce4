import type { Convention } from '../../shared/schemas/convention-schema';
import type { TargetIdentity } from '../../shared/target-identity';

/**
 * Why a point is not applicable to a target that states a convention other than the suite's: at
 * this point the two conventions give different values (a zero part on a cut, whose side one
 * convention takes from the zero's sign and the other from counter-clockwise continuity), so a
 * library that follows its own stated convention rightly answers the other one. Holding it to the
 * suite's would report its documented behaviour as a branch finding: 65 such findings against the
 * C library and 65 against NumPy on the demo catalogue's counter-clockwise suites before this rule.
 * Every point where the two agree is still checked, and a suite of the target's own convention
 * checks these.
 */
export function conventionMismatchReason(
  target: Pick<TargetIdentity, 'name'> & { convention: Convention },
  suiteConvention: Convention,
): string {
  return `${target.name} states the ${target.convention} convention, which gives another value here than this ${suiteConvention} suite expects (a zero part on a cut); a ${target.convention} suite checks this point`;
}
