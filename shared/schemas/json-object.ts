import { z } from 'zod';

/**
 * A strict JSON object schema whose own failures read as rules: a missing or
 * non-object body says so, and unknown fields are named.
 */
export function jsonObject<Shape extends z.ZodRawShape>(shape: Shape) {
  return z.strictObject(shape, {
    error: (issue) =>
      issue.code === 'unrecognized_keys' ? `has unknown fields: ${issue.keys.join(', ')}` : 'must be a JSON object',
  });
}
