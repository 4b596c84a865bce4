/**
 * One branch cut on an axis: the points x + 0i (axis "real") or 0 + iy (axis
 * "imaginary") with `from` ≤ x or y ≤ `to` (±Infinity allowed). `ccwSide` is the
 * side the cut's own values are continuous from under Kahan's counter-clockwise
 * rule: the region met turning counter-clockwise about the cut's finite end.
 */
export interface Cut {
  axis: 'real' | 'imaginary';
  from: number;
  to: number;
  ccwSide: 'upper' | 'lower' | 'left' | 'right';
}
