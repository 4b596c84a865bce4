import type { ComplexPair } from '../adapters/complex-pair';

/**
 * A branch cut in the plane: the segment from `from` to `to`, or with `toInfinity` the ray
 * from `from` through `to` and beyond. `ccwSide` is the side Kahan's counter-clockwise rule
 * closes ("upper", "lower", "left", "right"), or null where the catalogue does not say (the
 * reciprocal functions and regular-branch layouts).
 */
export interface PlaneCut {
  from: ComplexPair;
  to: ComplexPair;
  toInfinity: boolean;
  ccwSide: 'upper' | 'lower' | 'left' | 'right' | null;
  /** A short name for output: "(-inf, 0]", "[1, +inf)·i", "polyline 2 of a layout". */
  label: string;
}
