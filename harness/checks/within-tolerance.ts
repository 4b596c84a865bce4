import type { Tolerance } from '../../shared/schemas/tolerance-schema';

/**
 * Whether a finite value with these errors is within the tolerance (docs/suite-format.md
 * "Tolerances"): its larger per-part ulp distance within `ulps`, or its normwise relative error
 * within `relative`. With both bounds, a value within either passes, except that the normwise
 * bound does not forgive a non-zero part of the opposite sign to the reference's
 * (`oppositeSign`): complex.js's acosh(0.5 + 1e−300i) has real part −5.6e−17 where the principal
 * value's is +1.2e−300, outside the principal range Re ≥ 0 by noise — an accuracy finding to
 * report (with its cancellation), not a pass. A tolerance of `relative` alone is the normwise
 * error as written, signs included.
 */
export function withinTolerance(
  tolerance: Tolerance,
  ulps: number,
  relativeError: number,
  oppositeSign: boolean,
): boolean {
  if ('ulps' in tolerance && ulps <= tolerance.ulps) return true;
  if (!('relative' in tolerance)) return false;
  return relativeError <= tolerance.relative && !('ulps' in tolerance && oppositeSign);
}
