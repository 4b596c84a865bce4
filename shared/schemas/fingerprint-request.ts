import { z } from 'zod';
import { entryNameSchema } from './entry-name-schema';
import { textSchema } from './text-schema';

/**
 * The input of `sheetkeeper fingerprint` (flags as strings): which targets (comma-separated), optionally which
 * functions (comma-separated labels as the fingerprint names them, "sqrt,pow(z, 1/2),log"), the
 * entry values are built through, and how to write the result.
 */
export const fingerprintRequest = z.strictObject({
  target: textSchema('is required (NAME@VERSION as `sheetkeeper targets` lists it)')
    .transform((s) =>
      s
        .split(',')
        .map((x) => x.trim())
        .filter(Boolean),
    )
    .refine((list) => list.length > 0, { error: 'names no target' }),
  fn: textSchema()
    .transform((s) =>
      s
        .split(/,(?![^(]*\))/)
        .map((x) => x.trim())
        .filter(Boolean),
    )
    .optional(),
  /** The entry to build values through (`sheetkeeper targets` lists them); absent, the target's default. */
  entry: entryNameSchema.optional(),
  format: z.enum(['json', 'table'], { error: 'must be json or table' }).default('table'),
  out: textSchema().min(1).optional(),
});

export type FingerprintRequest = z.infer<typeof fingerprintRequest>;
