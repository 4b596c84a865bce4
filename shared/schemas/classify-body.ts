import { z } from 'zod';
import { textSchema } from './text-schema';
import { jsonObject } from './json-object';

/**
 * A reviewer's verdict on a failure. `bug` and `convention-difference` record what it is;
 * `accepted` is a deviation the team lives with until `expiresAt`, which keeps matching failures
 * out of regressions. `scope` says what the verdict covers on the same target (any version):
 * this point, this path, this suite, or this suite's failures with this diagnosis.
 */
export const classifyBody = jsonObject({
  classification: z.enum(['bug', 'convention-difference', 'accepted'], {
    error: 'must be bug, convention-difference or accepted',
  }),
  scope: z
    .enum(['point', 'path', 'suite', 'diagnosis'], { error: 'must be point, path, suite or diagnosis' })
    .default('point'),
  reason: textSchema('is required')
    .trim()
    .min(3, { error: 'must say why (at least 3 characters)' })
    .max(2000, { error: 'must be at most 2000 characters' }),
  expiresAt: z.iso.datetime({ offset: true, error: 'must be a date and time such as 2027-03-01T00:00:00Z' }).optional(),
}).superRefine((b, ctx) => {
  if (b.classification === 'accepted' && !b.expiresAt)
    ctx.addIssue({ code: 'custom', message: 'is required for an accepted deviation', path: ['expiresAt'] });
  if (b.expiresAt && Date.parse(b.expiresAt) <= Date.now())
    ctx.addIssue({ code: 'custom', message: 'must lie in the future', path: ['expiresAt'] });
});

export type ClassifyBody = z.infer<typeof classifyBody>;
