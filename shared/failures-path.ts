import type { FailureQuery } from './schemas/failure-query';

/**
 * The app's path of the failure table with these filters (`/failures?run=…&diagnosis=…`), in the
 * order given, the parameters the table reads with the server's own schema
 * (client/filters-from-params.ts): every link into the table — a run's cells and regressions, the
 * findings-by-kind picture, the regression mail — is made here. The literal type is one of the
 * app's typed routes.
 */
export function failuresPath(
  filters: Partial<Pick<FailureQuery, 'run' | 'suite' | 'target' | 'diagnosis' | 'status' | 'class'>>,
): '/failures' | `/failures?${string}` {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(filters)) if (value) params.set(key, value);
  const query = params.toString();
  return query ? `/failures?${query}` : '/failures';
}
