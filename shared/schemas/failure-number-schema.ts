import { textSchema } from './text-schema';

/** The largest `bigint` PostgreSQL stores (2^63 − 1): the `failures.id` column's type. */
const MAX_FAILURE_NUMBER = 9_223_372_036_854_775_807n;

/**
 * A failure's number as it travels in a path or a page cursor: decimal digits within the
 * `bigint` range. A longer number used to reach PostgreSQL, which answered "out of range for
 * type bigint" and the route a 500 (`?after=99999999999999999999`).
 */
export const failureNumberSchema = textSchema('must be a failure number')
  .regex(/^\d{1,19}$/, { error: 'must be a failure number', abort: true })
  // The refinement runs only after the pattern held (abort above): BigInt('1.5') throws.
  .refine((digits) => BigInt(digits) <= MAX_FAILURE_NUMBER, {
    error: `must be a failure number of at most ${MAX_FAILURE_NUMBER}`,
  });
