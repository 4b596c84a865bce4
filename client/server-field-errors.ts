import { ApiRequestError } from './api-request-error';

/**
 * The server's invalid-input issues of a failed request, keyed by field without the `body.`
 * prefix (`suites.2`, `cron`), first rule per field — for showing each beside its field.
 */
export function serverFieldErrors(error: unknown): Record<string, string> {
  if (!(error instanceof ApiRequestError) || error.body.kind !== 'invalid-input') return {};
  const errors: Record<string, string> = {};
  for (const issue of error.body.issues) {
    const field = issue.field.replace(/^body\.?/, '') || '(body)';
    errors[field] ??= issue.rule;
  }
  return errors;
}
