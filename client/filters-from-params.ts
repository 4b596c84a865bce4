import { failureQuery } from '../shared/schemas/failure-query';
import type { FailureFilters } from './failure-filters';

const KEYS = ['run', 'suite', 'target', 'fn', 'class', 'diagnosis', 'convention', 'status', 'sort'] as const;

/**
 * The filters a link or the address bar carries (`/failures?run=…&suite=…`), read with the
 * server's own schema: a parameter the server would refuse is dropped rather than breaking
 * the whole table, and returned in `dropped` so the screen can say so.
 */
export function filtersFromParams(params: Record<string, string | string[] | undefined>): {
  filters: FailureFilters;
  dropped: string[];
} {
  const filters: FailureFilters = {};
  const dropped: string[] = [];
  for (const key of KEYS) {
    const raw = params[key];
    const value = Array.isArray(raw) ? raw[0] : raw;
    if (value === undefined || value === '') continue;
    const parsed = failureQuery.safeParse({ [key]: value });
    if (parsed.success) (filters as Record<string, unknown>)[key] = parsed.data[key];
    else dropped.push(key);
  }
  if (filters.sort === 'id') delete filters.sort;
  return { filters, dropped };
}
