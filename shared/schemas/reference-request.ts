import { z } from 'zod';
import { textSchema } from './text-schema';
import { complexString, numberString } from './complex-string';
import { conventionSchema } from './convention-schema';
import { jsonObject } from './json-object';

/** One request line of `sheetkeeper reference` (docs/suite-format.md). */
export const referenceRequest = jsonObject({
  fn: textSchema('is required').max(20),
  z: complexString,
  convention: conventionSchema.default('signed-zero'),
  w: z
    .union([complexString, numberString], { error: 'must be {"re","im"} or a number string such as "1/3"' })
    .optional(),
  n: z.union([z.number().int(), textSchema().regex(/^[+-]?\d+$/)], { error: 'must be an integer' }).optional(),
  digits: z.number().int().min(1).max(200).optional(),
});

export type ReferenceRequest = z.infer<typeof referenceRequest>;
