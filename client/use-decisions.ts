import { useQuery } from '@tanstack/react-query';
import type { DecisionView } from '../shared/decision-view';
import type { DecisionListQuery } from '../shared/schemas/decision-list-query';
import { apiFetch } from './api-fetch';

export const DECISIONS_KEY = ['decisions'] as const;

/** The decisions (GET /api/deviations), newest first, filtered by library, suite or one id; expired and revoked ones included. */
export function useDecisions(filters: DecisionListQuery) {
  // toString, not URLSearchParams.size: the screen tests' DOM (and older browsers) have no size, and a
  // filtered list was asked for unfiltered.
  const query = new URLSearchParams(
    Object.entries(filters).filter((e): e is [string, string] => typeof e[1] === 'string' && e[1] !== ''),
  ).toString();
  return useQuery({
    queryKey: [...DECISIONS_KEY, filters],
    queryFn: async () =>
      (await apiFetch<{ deviations: DecisionView[] }>(`/deviations${query ? `?${query}` : ''}`)).deviations,
  });
}
