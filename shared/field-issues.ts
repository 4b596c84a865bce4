import type { z } from 'zod';
import type { FieldIssue } from './api-error';

/** Flattens a zod error into field/rule pairs, for the API and the forms alike. */
export function fieldIssues(error: z.ZodError): FieldIssue[] {
  return error.issues.map((issue) => ({
    field: issue.path.length > 0 ? issue.path.map(String).join('.') : '(body)',
    rule: issue.message,
  }));
}
