import type { ZodError } from 'zod';

/** The first problem of a refused request line, as `{"error": "<field path> <message>"}`. */
export function describeRequestError(error: ZodError): { error: string } {
  const issue = error.issues[0];
  const where = issue && issue.path.length > 0 ? `${issue.path.join('.')} ` : '';
  return { error: `${where}${issue?.message ?? 'is invalid'}` };
}
