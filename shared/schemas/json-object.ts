import { z } from 'zod';
import { objectError } from './object-error';

/**
 * A strict JSON object schema whose own failures read as rules: a missing or
 * non-object body says so, and unknown fields are named.
 */
export function jsonObject<Shape extends z.ZodRawShape>(shape: Shape) {
  return z.strictObject(shape, { error: objectError });
}
