import { z } from 'zod';
import { textSchema } from './text-schema';
import { jsonObject } from './json-object';

/** Route parameters `/:slug` and `/:slug/versions/:version`. */
export const suiteSlugParams = jsonObject({
  slug: textSchema()
    .regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, { error: 'must be lower-case words joined by hyphens' })
    .max(80),
});

export const suiteVersionParams = jsonObject({
  slug: textSchema()
    .regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, { error: 'must be lower-case words joined by hyphens' })
    .max(80),
  version: z.coerce
    .number({ error: 'must be a whole number' })
    .int({ error: 'must be a whole number' })
    .min(1, { error: 'must be at least 1' })
    .max(1_000_000),
});
