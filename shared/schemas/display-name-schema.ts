import { textSchema } from './text-schema';

/** A person's name as the app shows it beside their work. */
export const displayNameSchema = textSchema('is required')
  .trim()
  .min(1, { error: 'is required' })
  .max(80, { error: 'must be at most 80 characters' });
