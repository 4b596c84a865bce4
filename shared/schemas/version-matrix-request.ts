import { z } from 'zod';
import { entryNameSchema } from './entry-name-schema';
import { textSchema } from './text-schema';

/**
 * The input of `sheetkeeper matrix` (flags as strings): the suites (comma-separated suite
 * files, folders or ids, as `run --suite` takes them), the library to compare across its
 * installed versions — its target name without the version ("complex.js", "mathjs/complex",
 * "mathjs/number/predictable") — and the output.
 */
export const versionMatrixRequest = z.strictObject({
  suite: textSchema('is required (suite files, folders or ids, comma-separated)')
    .transform((s) =>
      s
        .split(',')
        .map((x) => x.trim())
        .filter(Boolean),
    )
    .refine((list) => list.length > 0, { error: 'names no suite' }),
  library: textSchema('is required (a target name without its version, e.g. complex.js)').min(1),
  /**
   * The entries to compare at, comma-separated ("complex,string"); absent, each suite at its own.
   * A release whose constructor drops −0 shows at the constructor's entry, not at one that builds
   * values another way.
   */
  entry: textSchema()
    .transform((s) =>
      s
        .split(',')
        .map((x) => x.trim())
        .filter(Boolean),
    )
    .pipe(z.array(entryNameSchema).min(1, { error: 'names no entry' }).max(8, { error: 'names more than 8 entries' }))
    .optional(),
  format: z.enum(['json', 'table'], { error: 'must be json or table' }).default('table'),
  out: textSchema().min(1).optional(),
});

export type VersionMatrixRequest = z.infer<typeof versionMatrixRequest>;
