import { z } from 'zod';

/**
 * The name of an uploaded file (a suite file, a reference table), which the uploads table keeps and
 * the app shows. 200 characters holds any real name (the demo's longest is 37) while a 5,005-character
 * one was stored before this rule; control characters (NUL included) and lone surrogates are refused
 * because PostgreSQL cannot store NUL and neither prints legibly.
 */
export const uploadFileName = z
  .string({ error: 'is required' })
  .min(1, { error: 'is required' })
  .max(200, { error: 'must be at most 200 characters' })
  .refine((name) => !/[\u0000-\u001f\u007f-\u009f]/.test(name), { error: 'must not contain control characters' })
  .refine((name) => !/[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/.test(name), {
    error: 'must not contain a lone surrogate',
  });
