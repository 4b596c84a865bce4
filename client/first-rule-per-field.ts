import type { z } from 'zod';

/** The first broken rule of each top-level field of a failed parse, for showing beside the field. */
export function firstRulePerField(error: z.ZodError | undefined): Record<string, string> {
  const rules: Record<string, string> = {};
  for (const issue of error?.issues ?? []) {
    const field = String(issue.path[0] ?? '(body)');
    rules[field] ??= issue.message;
  }
  return rules;
}
