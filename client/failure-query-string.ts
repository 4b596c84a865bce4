import type { FailureFilters } from './failure-filters';

/** The query string of the failure table (and of its CSV export) for these filters, without the leading "?". */
export function failureQueryString(
  filters: FailureFilters,
  page: { after?: string | null; limit?: number } = {},
): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(filters))
    if (value !== undefined && value !== '') params.set(key, String(value));
  if (page.after) params.set('after', page.after);
  if (page.limit) params.set('limit', String(page.limit));
  return params.toString();
}
