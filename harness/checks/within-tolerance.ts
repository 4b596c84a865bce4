import type { Tolerance } from '../../shared/schemas/tolerance-schema';

/**
 * Whether a finite value with these errors is within the tolerance: its larger per-part ulp
 * distance within `ulps`, or its normwise relative error within `relative`; a tolerance with
 * both passes a value within either (tolerance-schema.ts says why).
 */
export function withinTolerance(tolerance: Tolerance, ulps: number, relativeError: number): boolean {
  return (
    ('ulps' in tolerance && ulps <= tolerance.ulps) || ('relative' in tolerance && relativeError <= tolerance.relative)
  );
}
