import type { Tolerance } from '../../shared/schemas/tolerance-schema';

/** 2^−52, one ulp of 1. */
const ULP_OF_ONE = 2 ** -52;

/**
 * A suite's property tolerance as a relative error for laws that compose several operations
 * (a root raised to its power, exp of log, a sum of logs): n ulps is read as n·2^−52 relative,
 * since a per-part ulp count means nothing for a part that cancels; a relative tolerance is
 * used as written; with both, the looser. The law scales it by its own condition number.
 */
export function lawTolerance(tolerance: Tolerance): number {
  // Either bound passes (tolerance-schema.ts), so the looser of the two applies.
  return Math.max(
    'ulps' in tolerance ? tolerance.ulps * ULP_OF_ONE : 0,
    'relative' in tolerance ? tolerance.relative : 0,
  );
}
