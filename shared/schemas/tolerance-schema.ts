import { z } from 'zod';
import { objectError } from './object-error';

/** How far a value may be from the reference: in ulps per component, or as a relative error of the whole value. */
export const toleranceSchema = z.union(
  [
    z.strictObject(
      {
        ulps: z
          .number()
          .min(0, { error: 'must be at least 0' })
          .max(2 ** 52, { error: 'must be at most 2^52' }),
      },
      { error: objectError },
    ),
    z.strictObject(
      { relative: z.number().positive({ error: 'must be positive' }).max(1, { error: 'must be at most 1' }) },
      { error: objectError },
    ),
  ],
  { error: 'must be {"ulps": n} or {"relative": x}' },
);

export type Tolerance = z.infer<typeof toleranceSchema>;
