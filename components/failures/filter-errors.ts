import { serverFieldErrors } from '../../client/server-field-errors';

/**
 * The failure table's filters the server refused, by filter key (`run`), from a failed page
 * request: the server names them `query.<key>` (a short run id that names no run or two, which
 * only it can tell). Empty for any other error.
 */
export function filterErrors(error: unknown): Partial<Record<string, string>> {
  const refused: Partial<Record<string, string>> = {};
  for (const [field, rule] of Object.entries(serverFieldErrors(error)))
    if (field.startsWith('query.')) refused[field.slice('query.'.length)] = rule;
  return refused;
}
