import { useQuery } from '@tanstack/react-query';
import type { RunView } from '../shared/run-view';
import { apiFetch } from './api-fetch';
import { isLiveRun } from './is-live-run';
import { RUNS_KEY } from './use-runs';

/** How often a queued or running run is asked for again, in ms. */
const LIVE_INTERVAL = 1_500;

export const runKey = (id: string) => [...RUNS_KEY, 'detail', id] as const;

/** One run; polled while it is queued or running, so its progress bar moves by itself. */
export function useRun(id: string) {
  return useQuery({
    queryKey: runKey(id),
    queryFn: async () => (await apiFetch<{ run: RunView }>(`/runs/${id}`)).run,
    refetchInterval: (query) => (query.state.data && isLiveRun(query.state.data) ? LIVE_INTERVAL : false),
  });
}
