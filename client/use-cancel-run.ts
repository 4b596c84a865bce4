import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RunView } from '../shared/run-view';
import { apiFetch } from './api-fetch';
import { OVERVIEW_KEY } from './use-overview';
import { runKey } from './use-run';
import { RUNS_KEY } from './use-runs';

/**
 * Cancels a queued or running run. The run shows as cancelled at once; if the server refuses
 * (it finished meanwhile, or the caller may not), the run as it was comes back.
 */
export function useCancelRun(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async () => (await apiFetch<{ run: RunView }>(`/runs/${id}/cancel`, { method: 'POST' })).run,
    onMutate: async () => {
      await queryClient.cancelQueries({ queryKey: runKey(id), exact: true });
      const before = queryClient.getQueryData<RunView>(runKey(id));
      if (before) queryClient.setQueryData<RunView>(runKey(id), { ...before, status: 'cancelled' });
      return { before };
    },
    onError: (_error, _vars, context) => {
      if (context?.before) queryClient.setQueryData(runKey(id), context.before);
    },
    onSuccess: (run) => queryClient.setQueryData(runKey(id), run),
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: RUNS_KEY }),
        queryClient.invalidateQueries({ queryKey: OVERVIEW_KEY }),
      ]),
  });
}
