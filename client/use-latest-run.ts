import { useQuery } from '@tanstack/react-query';
import type { RunView } from '../shared/run-view';
import { apiFetch } from './api-fetch';
import { isLiveRun } from './is-live-run';
import { RUNS_KEY } from './use-runs';

/** How often a plan's latest run is asked for again while it is queued or running, in ms. */
const LIVE_INTERVAL = 2_000;

/**
 * A plan's newest run, whatever its state (one row of `GET /api/runs`), or null before its first;
 * under RUNS_KEY, so starting or cancelling a run refreshes it, and polled while it is live.
 */
export function useLatestRun(planId: string) {
  return useQuery({
    queryKey: [...RUNS_KEY, 'latest', planId],
    queryFn: async () =>
      (await apiFetch<{ runs: RunView[] }>(`/runs?${new URLSearchParams({ plan: planId, limit: '1' }).toString()}`))
        .runs[0] ?? null,
    staleTime: 5_000,
    refetchInterval: (q) => (q.state.data && isLiveRun(q.state.data) ? LIVE_INTERVAL : false),
  });
}
