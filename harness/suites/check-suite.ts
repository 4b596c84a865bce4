import { branchSpecSchema } from '../../shared/schemas/branch-spec-schema';
import type { SuiteIssue } from '../../shared/suite-issue';
import { validateSuite, type SuiteValidation } from '../../shared/validate-suite';
import { checkSuiteSemantics } from './check-suite-semantics';

/**
 * The one full check of a suite, used by the server (forms, uploads) and by the suite form
 * as the author types: the shared schema, then what only the harness can see — the subject
 * and g under the whitelist, and a regular branch's cut layout (every branch point on a cut,
 * every cut-free loop with monodromy 1, the failing loop named under `branch.cuts`).
 *
 * The deeper checks run on whichever parts passed the schema, so an unfinished title does
 * not hide a broken cut layout; a deeper rule on a field the schema already faults is dropped.
 */
export function checkSuite(data: unknown, fallbackName: string): SuiteValidation {
  const shallow = validateSuite(data, fallbackName);
  if (shallow.ok) {
    const deeper = checkSuiteSemantics(shallow.suite);
    return deeper.length === 0 ? shallow : { ok: false, issues: deeper };
  }
  const issues: SuiteIssue[] = [...shallow.issues];
  const name = issues[0]?.suite ?? fallbackName;
  const record = data && typeof data === 'object' ? (data as Record<string, unknown>) : {};
  const faulted = (field: string) => issues.some((i) => i.field === field || i.field.startsWith(`${field}.`));
  const subject = typeof record.subject === 'string' && !faulted('subject') ? record.subject : null;
  const branch = faulted('branch') ? null : branchSpecSchema.safeParse(record.branch);
  if (subject === null && !branch?.success) return shallow;
  const deeper = checkSuiteSemantics({
    id: name,
    subject: subject ?? 'z',
    branch: branch?.success ? branch.data : { kind: 'principal' },
  });
  for (const issue of deeper) if (!faulted(issue.field)) issues.push(issue);
  return { ok: false, issues };
}
