import { z } from 'zod';

/** A strict schema for query parameters: unknown ones are named, anything else is "is invalid". */
export function queryObject<Shape extends z.ZodRawShape>(shape: Shape) {
  return z.strictObject(shape, {
    error: (issue) =>
      issue.code === 'unrecognized_keys' ? `has unknown parameters: ${issue.keys.join(', ')}` : 'is invalid',
  });
}
