import { fieldIssues } from './field-issues';
import { suiteSchema, type Suite } from './schemas/suite-schema';
import type { SuiteIssue } from './suite-issue';

export type SuiteValidation = { ok: true; suite: Suite } | { ok: false; issues: SuiteIssue[] };

/**
 * Validates a suite with the shared schema. Every issue names the suite (its id, else
 * `fallbackName`, e.g. the file name), the dotted field and the rule, e.g.
 * `sqrt-on-the-cut: paths.2.radius must be a number written as a string`.
 */
export function validateSuite(data: unknown, fallbackName: string): SuiteValidation {
  const result = suiteSchema.safeParse(data);
  if (result.success) return { ok: true, suite: result.data };
  const id =
    data && typeof data === 'object' && 'id' in data && typeof data.id === 'string' && /^[a-z0-9-]{1,80}$/.test(data.id)
      ? data.id
      : fallbackName;
  return { ok: false, issues: fieldIssues(result.error).map((issue) => ({ suite: id, ...issue })) };
}
