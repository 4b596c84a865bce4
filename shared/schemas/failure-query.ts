import { z } from 'zod';
import { textSchema } from './text-schema';
import { failureNumberSchema } from './failure-number-schema';
import { queryObject } from './query-object';
import { DIAGNOSIS_KINDS } from '../diagnosis-kinds';

const text = textSchema().trim().min(1).max(120);

/** A page cursor as the server writes it: a failure number, and after sorting by ulps `:<ulps>`, a finite number. */
function isCursor(cursor: string): boolean {
  const [id, ulps] = cursor.split(':');
  return failureNumberSchema.safeParse(id).success && (ulps === undefined || Number.isFinite(Number(ulps)));
}

/**
 * Filters of the failure table. `status`: `new` = a regression (passed in the previous run of
 * the plan), `known` = failed before too and not accepted, `accepted` = covered by an unexpired
 * accepted deviation. Pages are keyed by the last row's id (`after`), or
 * by (ulps, id) when sorted by ulps.
 */
export const failureQuery = queryObject({
  run: z.uuid({ error: 'must be a run id' }).optional(),
  suite: text.optional(),
  target: text.optional(),
  fn: textSchema()
    .regex(/^[a-z]+$/, { error: 'must be a function name' })
    .max(20)
    .optional(),
  diagnosis: z
    .enum([...DIAGNOSIS_KINDS, 'error', 'skipped'], {
      error: `must be one of ${[...DIAGNOSIS_KINDS, 'error', 'skipped'].join(', ')}`,
    })
    .optional(),
  convention: z
    .enum(['signed-zero', 'counter-clockwise'], { error: 'must be signed-zero or counter-clockwise' })
    .optional(),
  status: z.enum(['new', 'known', 'accepted'], { error: 'must be new, known or accepted' }).optional(),
  sort: z.enum(['id', 'ulps'], { error: 'must be id or ulps' }).default('id'),
  after: textSchema()
    .regex(/^\d+(:[\d.e+-]+)?$/, { error: 'must be a cursor from a previous page', abort: true })
    .refine(isCursor, { error: 'must be a cursor from a previous page' })
    .optional(),
  limit: z.coerce
    .number({ error: 'must be a whole number' })
    .int()
    .min(1, { error: 'must be at least 1' })
    .max(500, { error: 'must be at most 500' })
    .default(50),
});

export type FailureQuery = z.infer<typeof failureQuery>;
