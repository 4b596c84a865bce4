import type { FailureQuery } from './schemas/failure-query';

/**
 * The app's path of the failure table with these filters (`/failures?run=…&diagnosis=…`), the
 * parameters the table reads with the server's own schema (client/filters-from-params.ts): the
 * findings-by-kind picture and the regression mail link to it.
 */
export function failuresPath(filters: Partial<Pick<FailureQuery, 'run' | 'diagnosis' | 'status' | 'class'>>): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(filters)) if (value) params.set(key, value);
  const query = params.toString();
  return query ? `/failures?${query}` : '/failures';
}
