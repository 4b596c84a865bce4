import { z } from 'zod';
import { objectError } from './object-error';

const ulps = z
  .number()
  .min(0, { error: 'must be at least 0' })
  .max(2 ** 52, { error: 'must be at most 2^52' });
const relative = z.number().positive({ error: 'must be positive' }).max(1, { error: 'must be at most 1' });

/**
 * How far a value may be from the reference (docs/suite-format.md "Tolerances"): `{ulps}` holds
 * each part to that many ulps of the reference's part; `{relative}` holds the whole value to a
 * normwise relative error |actual − expected| / |expected|; `{ulps, relative}` passes a value
 * within either bound — the normwise bound forgives a tiny part lost to cancellation beside a
 * large one (a few eps of the whole value are 1e18 ulps of a 1e-21 part) unless that part has
 * the opposite sign, the ulps bound forgives one-ulp errors of subnormal results (a relative
 * error near 1 there). harness/checks/within-tolerance.ts applies it.
 */
export const toleranceSchema = z.union(
  [
    z.strictObject({ ulps }, { error: objectError }),
    z.strictObject({ relative }, { error: objectError }),
    z.strictObject({ ulps, relative }, { error: objectError }),
  ],
  // zod names the broken rule of a one-bound tolerance; of a two-bound one it reports the union,
  // so the message states every rule.
  { error: 'must be {"ulps": n} with 0 ≤ n ≤ 2^52, {"relative": x} with 0 < x ≤ 1, or both' },
);

export type Tolerance = z.infer<typeof toleranceSchema>;
