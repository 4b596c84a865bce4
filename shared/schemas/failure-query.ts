import { z } from 'zod';
import { textSchema } from './text-schema';
import { failureNumberSchema } from './failure-number-schema';
import { queryObject } from './query-object';
import { runIdPrefix } from './run-id-prefix';
import { DIAGNOSIS_KINDS } from '../diagnosis-kinds';
import { DIAGNOSIS_CLASSES } from '../diagnosis-classes';

const text = textSchema().trim().min(1).max(120);

/**
 * A page cursor as the server writes it: a failure number and its place in the class order
 * (`<id>:<rank>`, rank 0 for branch findings, 1 for accuracy, 2 for errors and skipped points),
 * and after sorting by ulps `:<ulps>`, a finite number.
 */
function isCursor(cursor: string): boolean {
  const [id, , ulps] = cursor.split(':');
  return failureNumberSchema.safeParse(id).success && (ulps === undefined || Number.isFinite(Number(ulps)));
}

/**
 * Filters of the failure table. `run` may be a run's short id or any longer start of it
 * (run-id-prefix.ts); the server resolves it to one run or names the field. `diagnosis` matches a point with that label among any of its
 * labels (not only the leading one); `class` matches branch or accuracy findings. Every page
 * lists branch findings first, then accuracy findings, then errors and skipped points, each
 * newest first (`sort=id`, the default) or largest error first (`sort=ulps`). `status`: `new` = a regression (passed in the previous run of
 * the plan), `known` = failed before too and not accepted, `accepted` = covered by an unexpired
 * accepted deviation. Pages are keyed by the last row's (rank, id) (`after`), or
 * by (rank, ulps, id) when sorted by ulps.
 */
export const failureQuery = queryObject({
  run: runIdPrefix.optional(),
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
  class: z.enum(DIAGNOSIS_CLASSES, { error: `must be one of ${DIAGNOSIS_CLASSES.join(', ')}` }).optional(),
  convention: z
    .enum(['signed-zero', 'counter-clockwise'], { error: 'must be signed-zero or counter-clockwise' })
    .optional(),
  status: z.enum(['new', 'known', 'accepted'], { error: 'must be new, known or accepted' }).optional(),
  sort: z.enum(['id', 'ulps'], { error: 'must be id or ulps' }).default('id'),
  after: textSchema()
    .regex(new RegExp(`^\\d+:[0-${DIAGNOSIS_CLASSES.length}](:[\\d.e+-]+)?$`), {
      error: 'must be a cursor from a previous page',
      abort: true,
    })
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
