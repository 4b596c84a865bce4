import { z } from 'zod';
import { textSchema } from './text-schema';
import { jsonObject } from './json-object';

/** Body of replacing my subscriptions: the libraries (target names without versions) I want regression mail about. */
export const subscriptionsBody = jsonObject({
  targetKeys: z
    .array(
      textSchema().regex(/^[A-Za-z0-9._-]+(\/[A-Za-z0-9._-]+)*$/, {
        error: 'must be a library name such as complex.js or mathjs/number',
      }),
      { error: 'must be a list' },
    )
    .max(100, { error: 'must have at most 100 entries' })
    .refine((keys) => new Set(keys).size === keys.length, { error: 'must not repeat a library' }),
});
