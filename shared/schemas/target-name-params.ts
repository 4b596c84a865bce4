import { textSchema } from './text-schema';
import { jsonObject } from './json-object';

/**
 * Route parameter `/:name`: a target's name as `GET /api/targets` lists it ("complex.js@2.4.3",
 * "mathjs@15.2.0/number/predictable"), or a library's name without the version ("mathjs/complex").
 * Names with a slash travel percent-encoded in one path segment.
 */
export const targetNameParams = jsonObject({
  name: textSchema().min(1, { error: 'is required' }).max(200, { error: 'must be at most 200 characters' }),
});
