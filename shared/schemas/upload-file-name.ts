import { textSchema } from './text-schema';

/**
 * The name of an uploaded file (a suite file, a reference table), which the uploads table keeps and
 * the app shows. 200 characters holds any real name (the demo's longest is 37) while a 5,005-character
 * one was stored before this rule; NUL and lone surrogates are refused by the text rule every field
 * shares (text-schema.ts), other control characters here, since none prints legibly.
 */
export const uploadFileName = textSchema('is required')
  .min(1, { error: 'is required' })
  .max(200, { error: 'must be at most 200 characters' })
  .refine((name) => !/[\u0000-\u001f\u007f-\u009f]/.test(name), { error: 'must not contain control characters' });
