/**
 * One condition of a principal range: a part of the value (`re`, `im`, or `arg`, the
 * argument of the value) lies in [min, max]. `ccwOpenMin` says Kahan's rule leaves the lower
 * edge out — it is reached only from below the cut, and the rule closes the cut from above.
 */
export interface RangeCondition {
  part: 're' | 'im' | 'arg';
  min: number;
  max: number;
  ccwOpenMin: boolean;
}
