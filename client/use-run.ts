import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect, useRef } from 'react';
import type { RunView } from '../shared/run-view';
import { apiFetch } from './api-fetch';
import { findingsByKindKey } from './findings-by-kind-key';
import { isLiveRun } from './is-live-run';
import { RUNS_KEY } from './use-runs';

/** How often a queued or running run is asked for again, in ms. */
const LIVE_INTERVAL = 1_500;

export const runKey = (id: string) => [...RUNS_KEY, 'detail', id] as const;

/**
 * One run; polled while it is queued or running, so its progress bar moves by itself. This query
 * is the one source of "finished" for the run page: the run's other queries (matrix, property
 * checks) poll while `isLiveRun` of its data holds, and when it is seen to flip they are all
 * fetched once more. Their last poll may predate the end by up to their interval (2.5 s, 5 s),
 * and a run page must not say "completed" over cells that still wait.
 */
export function useRun(id: string) {
  const queryClient = useQueryClient();
  const query = useQuery({
    queryKey: runKey(id),
    queryFn: async () => (await apiFetch<{ run: RunView }>(`/runs/${id}`)).run,
    refetchInterval: (q) => (q.state.data && isLiveRun(q.state.data) ? LIVE_INTERVAL : false),
  });
  const live = query.data ? isLiveRun(query.data) : undefined;
  const planId = query.data?.planId;
  const wasLive = useRef(live);
  useEffect(() => {
    if (wasLive.current === true && live === false) {
      const key = runKey(id);
      void queryClient.invalidateQueries({ queryKey: key, predicate: (q) => q.queryKey.length > key.length });
      // The plan's findings picture counts completed runs: the plan page shows this one when opened next.
      if (planId) void queryClient.invalidateQueries({ queryKey: findingsByKindKey(planId) });
    }
    wasLive.current = live;
  }, [id, live, planId, queryClient]);
  return query;
}
