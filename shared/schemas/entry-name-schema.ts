import { textSchema } from './text-schema';

/**
 * The name of a target's entry (shared/target-entry.ts) in a suite or a path: a lower-case word
 * such as "complex", "string" or "number". Whether the target offers it is known only when the
 * suite meets a target: an entry it lacks makes that pair an error listing its entries.
 */
export const entryNameSchema = textSchema('is required')
  .regex(/^[a-z][a-z0-9]*(-[a-z0-9]+)*$/, { error: 'must be a lower-case word such as "complex" or "string"' })
  .max(40, { error: 'must be at most 40 characters' });
