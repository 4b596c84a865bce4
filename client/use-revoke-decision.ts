import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DecisionView } from '../shared/decision-view';
import { apiFetch } from './api-fetch';
import { DECISIONS_KEY } from './use-decisions';
import { FAILURES_KEY } from './use-failures';

/**
 * Revokes a decision; it stays listed as revoked. The failure table's marks and statuses and the
 * case pages change with it, so those are fetched again.
 */
export function useRevokeDecision() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (id: string) =>
      (await apiFetch<{ deviation: DecisionView }>(`/deviations/${encodeURIComponent(id)}/revoke`, { method: 'POST' }))
        .deviation,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: DECISIONS_KEY }),
        queryClient.invalidateQueries({ queryKey: FAILURES_KEY }),
        queryClient.invalidateQueries({ queryKey: ['failure'] }),
      ]),
  });
}
