import { useInfiniteQuery } from '@tanstack/react-query';
import type { RunView } from '../shared/run-view';
import type { RunListQuery } from '../shared/schemas/run-list-query';
import { apiFetch } from './api-fetch';
import { isLiveRun } from './is-live-run';

/** Every run query starts with this key, so starting or cancelling a run can refresh them all at once. */
export const RUNS_KEY = ['runs'] as const;

export type RunFilters = Pick<RunListQuery, 'plan' | 'status' | 'trigger'>;

/** How often a list with a run in progress asks again, in ms. */
const LIVE_INTERVAL = 2_000;
const PAGE_SIZE = 25;

/**
 * Runs, newest first, filtered; older pages load on demand. While a run on screen is queued or
 * running the list refreshes itself so its progress and counts move.
 */
export function useRuns(filters: RunFilters) {
  return useInfiniteQuery({
    queryKey: [...RUNS_KEY, 'list', filters],
    queryFn: ({ pageParam }) => {
      const params = new URLSearchParams({ limit: String(PAGE_SIZE) });
      for (const [key, value] of Object.entries(filters)) if (value) params.set(key, value);
      if (pageParam) params.set('before', pageParam);
      return apiFetch<{ runs: RunView[]; next: string | null }>(`/runs?${params.toString()}`);
    },
    initialPageParam: null as string | null,
    getNextPageParam: (last) => last.next,
    // Runs start elsewhere (Plans, schedules, the API): look again whenever the screen opens after a few seconds.
    staleTime: 5_000,
    refetchInterval: (query) =>
      query.state.data?.pages.some((page) => page.runs.some(isLiveRun)) ? LIVE_INTERVAL : false,
  });
}
