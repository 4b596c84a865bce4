import { z } from 'zod';
import { MAX_CONFIGURED_TARGETS } from './max-configured-targets';
import { textSchema } from './schemas/text-schema';
import { targetSource } from './target-source';

/**
 * A project's `sheetkeeper.config.json` (docs/target-sources.md): the targets it names beside the
 * installed ones, and optionally where npm versions and unpacked tarballs are cached (relative to
 * the file's folder). `$schema` lets an editor find sheetkeeper.config.schema.json, generated from
 * this schema by `npm run config:schema`.
 */
export const sheetkeeperConfig = z.strictObject({
  $schema: textSchema().max(4096).optional(),
  targets: z.array(targetSource).max(MAX_CONFIGURED_TARGETS, `may name at most ${MAX_CONFIGURED_TARGETS} targets`),
  cacheDir: textSchema()
    .min(1)
    .max(4096)
    .refine((s) => !/[\u0000-\u001f\u007f]/.test(s), 'must not contain control characters')
    .optional(),
});

export type SheetkeeperConfig = z.infer<typeof sheetkeeperConfig>;
