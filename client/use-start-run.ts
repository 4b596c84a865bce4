import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RunView } from '../shared/run-view';
import { apiFetch } from './api-fetch';
import { OVERVIEW_KEY } from './use-overview';
import { runKey } from './use-run';
import { RUNS_KEY } from './use-runs';

/**
 * Starts a run of a plan now (`POST /api/runs` answers 202 with the queued run, or 200 with
 * `existing: true` and the plan's run already queued or running); the run lists and the Overview then show it.
 */
export function useStartRun() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (planId: string) =>
      apiFetch<{ run: RunView; existing: boolean }>('/runs', { method: 'POST', body: { planId } }),
    onSuccess: ({ run }) => {
      queryClient.setQueryData(runKey(run.id), run);
      void queryClient.invalidateQueries({ queryKey: [...RUNS_KEY, 'list'] });
      void queryClient.invalidateQueries({ queryKey: OVERVIEW_KEY });
    },
  });
}
