import type { Tolerance } from '../../shared/schemas/tolerance-schema';
import { comparePart } from './compare-part';
import type { ComplexDouble } from './complex-double';
import { oppositeSign } from './opposite-sign';
import { relativeError } from './relative-error';
import type { ValueCheck } from './value-check';
import { withinTolerance } from './within-tolerance';

/**
 * Compares a library value with the correctly rounded reference. A NaN part passes only
 * against NaN, an infinity only against the same infinity. With `zeroSigns` (the signed-zero
 * convention) a zero part must also carry the reference's sign; under counter-clockwise
 * continuity the sign of a zero result is not part of the contract. Finite parts are then held
 * to the tolerance: ulps per part, the normwise relative error of the whole value, or either
 * (withinTolerance).
 */
export function checkValue(
  actual: ComplexDouble,
  expected: ComplexDouble,
  tolerance: Tolerance,
  zeroSigns: boolean,
): ValueCheck {
  const re = comparePart(actual[0], expected[0]);
  const im = comparePart(actual[1], expected[1]);
  const zeroSignDiffers = zeroSigns
    ? (['re', 'im'] as const).filter((p) => (p === 're' ? re : im).zeroSignDiffers)
    : [];
  const finitenessDiffers = re.finitenessDiffers || im.finitenessDiffers;
  const ulps = Math.max(re.ulps, im.ulps);
  const relErr = relativeError(actual, expected);
  const within = withinTolerance(tolerance, ulps, relErr, oppositeSign(actual[0], actual[1], expected[0], expected[1]));
  return {
    pass: !finitenessDiffers && zeroSignDiffers.length === 0 && within,
    ulps,
    relativeError: relErr,
    zeroSignDiffers: [...zeroSignDiffers],
    finitenessDiffers,
  };
}
