import type { Tolerance } from '../../shared/schemas/tolerance-schema';

/** 2^−52, one ulp of 1. */
const ULP_OF_ONE = 2 ** -52;

/**
 * t, the normwise relative error one library value is allowed in a property law, from the
 * suite's property tolerance: n ulps is read as n·2^−52 relative (a per-part ulp count means
 * nothing for a part far below the other, or one that cancels); a relative tolerance is used as
 * written; with both, the looser. Each law scales t by the condition of what it composes (its
 * `allowance`).
 */
export function lawTolerance(tolerance: Tolerance): number {
  // Either bound passes (tolerance-schema.ts), so the looser of the two applies.
  return Math.max(
    'ulps' in tolerance ? tolerance.ulps * ULP_OF_ONE : 0,
    'relative' in tolerance ? tolerance.relative : 0,
  );
}
