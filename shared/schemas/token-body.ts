import { textSchema } from './text-schema';
import { jsonObject } from './json-object';

/** Body of creating an API token: a name that says where it is used. */
export const tokenBody = jsonObject({
  name: textSchema('is required')
    .trim()
    .min(3, { error: 'must be at least 3 characters' })
    .max(80, { error: 'must be at most 80 characters' }),
});
