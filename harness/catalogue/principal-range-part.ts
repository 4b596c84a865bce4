import type { RangeCondition } from '../properties/range-condition';

/** One closed condition of a principal range; `ccwOpenMin` where Kahan's rule leaves the lower edge out. */
export function principalRangePart(
  part: RangeCondition['part'],
  min: number,
  max: number,
  ccwOpenMin = false,
): RangeCondition {
  return { part, min, max, ccwOpenMin };
}
