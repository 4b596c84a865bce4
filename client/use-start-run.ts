import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RunView } from '../shared/run-view';
import { apiFetch } from './api-fetch';

/** Starts a run of a plan now (`POST /api/runs` answers 202 with the queued run). */
export function useStartRun() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (planId: string) => (await apiFetch<{ run: RunView }>('/runs', { method: 'POST', body: { planId } })).run,
    onSuccess: (run) => {
      queryClient.setQueryData(['runs', run.id], run);
      void queryClient.invalidateQueries({ queryKey: ['runs'], exact: true });
    },
  });
}
