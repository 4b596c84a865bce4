import { z } from 'zod';

/**
 * The input of `sheetkeeper fingerprint` (flags as strings): which target, optionally which
 * functions (comma-separated labels as the fingerprint names them, "sqrt,pow(z, 1/2),log"), and
 * how to write the result.
 */
export const fingerprintRequest = z.strictObject({
  target: z.string({ error: 'is required (NAME@VERSION as `sheetkeeper targets` lists it)' }).min(1),
  fn: z
    .string()
    .transform((s) => s.split(/,(?![^(]*\))/).map((x) => x.trim()).filter(Boolean))
    .optional(),
  format: z.enum(['json', 'table'], { error: 'must be json or table' }).default('table'),
  out: z.string().min(1).optional(),
});

export type FingerprintRequest = z.infer<typeof fingerprintRequest>;
