import type { z } from 'zod';
import type { apiErrorSchema } from './api-error-schema';

/**
 * Every error body the API sends, derived from its schema (`api-error-schema.ts`, which the
 * OpenAPI document shows). `kind` tells the app how to show it; `issues` is present for
 * `invalid-input` only.
 */
export type ApiError = z.infer<typeof apiErrorSchema>;

/** One broken rule of an input: the dotted field path and what the rule says. */
export type FieldIssue = Extract<ApiError, { kind: 'invalid-input' }>['issues'][number];
