import { z } from 'zod';
import { DECISION_VERSIONS, DEFAULT_DECISION_VERSIONS } from '../decision-versions';
import { expiryDaySchema } from './expiry-day-schema';
import { textSchema } from './text-schema';
import { jsonObject } from './json-object';

/**
 * A reviewer's verdict on a failure. `bug` and `convention-difference` record what it is;
 * `accepted` is a deviation the team lives with until `expiresAt`, which keeps matching failures
 * out of regressions. `scope` says what the verdict covers on the same library: this point, this
 * path, this suite, or this suite's failures with this diagnosis; `versions` says which versions
 * of the library (shared/decision-versions.ts; left out, every version, as before it existed).
 * `expiresAt` is a day (2027-01-31) or, as the API took before, a date and time with an offset.
 */
export const classifyBody = jsonObject({
  classification: z.enum(['bug', 'convention-difference', 'accepted'], {
    error: 'must be bug, convention-difference or accepted',
  }),
  scope: z
    .enum(['point', 'path', 'suite', 'diagnosis'], { error: 'must be point, path, suite or diagnosis' })
    .default('point'),
  versions: z
    .enum(DECISION_VERSIONS, { error: `must be ${DECISION_VERSIONS.join(', ')}` })
    .default(DEFAULT_DECISION_VERSIONS),
  reason: textSchema('is required')
    .trim()
    .min(3, { error: 'must say why (at least 3 characters)' })
    .max(2000, { error: 'must be at most 2000 characters' }),
  expiresAt: expiryDaySchema.optional(),
}).superRefine((b, ctx) => {
  if (b.classification === 'accepted' && !b.expiresAt)
    ctx.addIssue({ code: 'custom', message: 'is required for an accepted deviation', path: ['expiresAt'] });
});

/** The body as the route reads it (defaults filled, the day as midnight UTC). */
export type ClassifyBody = z.infer<typeof classifyBody>;
