import { useQuery } from '@tanstack/react-query';
import type { SuiteStatus } from '../shared/suite-status';
import type { SuiteSummary } from '../shared/suite-summary';
import { apiFetch } from './api-fetch';

export const SUITES_KEY = ['suites'] as const;

/** Suites with their latest version, filtered by that version's status and a search over id, title and subject. */
export function useSuites(filter: { status?: SuiteStatus; q?: string } = {}) {
  const params = new URLSearchParams();
  if (filter.status) params.set('status', filter.status);
  if (filter.q?.trim()) params.set('q', filter.q.trim());
  const query = params.toString();
  return useQuery({
    queryKey: [...SUITES_KEY, { status: filter.status ?? null, q: filter.q?.trim() ?? '' }],
    queryFn: async () => (await apiFetch<{ suites: SuiteSummary[] }>(`/suites${query ? `?${query}` : ''}`)).suites,
    placeholderData: (previous) => previous,
  });
}
