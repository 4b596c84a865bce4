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
 * large one (a few eps of the whole value are 1e18 ulps of a 1e-21 part), the ulps bound
 * forgives one-ulp errors of subnormal results (a relative error near 1 there).
 */
export const toleranceSchema = z.union(
  [
    z.strictObject({ ulps }, { error: objectError }),
    z.strictObject({ relative }, { error: objectError }),
    z.strictObject({ ulps, relative }, { error: objectError }),
  ],
  { error: 'must be {"ulps": n}, {"relative": x} or {"ulps": n, "relative": x}' },
);

export type Tolerance = z.infer<typeof toleranceSchema>;
