import { z } from 'zod';
import { entryNameSchema } from './entry-name-schema';
import { objectError } from './object-error';
import { textSchema } from './text-schema';

/**
 * Another way to compute a suite's subject that must give the same values at its points
 * (docs/suite-format.md, "Counterparts"): another subject through the same library
 * (`"subject": "z^(1/2)"` beside `sqrt(z)`), the same subject through another of the target's
 * entries (`"entry": "…"`), or both. A point where the two library values differ beyond the
 * suite's value tolerance (or in the sign of a zero part under the signed-zero convention) gets
 * the `disagreement` label.
 */
export const counterpartSchema = z
  .strictObject(
    {
      subject: textSchema()
        .min(1, { error: 'must not be empty' })
        .max(400, { error: 'must be at most 400 characters' })
        .optional(),
      entry: entryNameSchema.optional(),
    },
    { error: objectError },
  )
  .refine((c) => c.subject !== undefined || c.entry !== undefined, {
    error: 'give a subject, an entry or both',
    path: ['subject'],
  });

export type Counterpart = z.infer<typeof counterpartSchema>;
