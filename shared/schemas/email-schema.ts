import { z } from 'zod';
import { textSchema } from './text-schema';

/** An account's e-mail address as every form and route takes it: trimmed, lower-cased, at most 254 characters (RFC 5321's path limit). */
export const emailSchema = textSchema('is required')
  .trim()
  .toLowerCase()
  .min(1, { error: 'is required' })
  .max(254, { error: 'must be at most 254 characters' })
  .pipe(z.email({ error: 'must be an e-mail address' }));
