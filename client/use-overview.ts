import { useQuery } from '@tanstack/react-query';
import type { OverviewView } from '../shared/overview-view';
import { apiFetch } from './api-fetch';

export const OVERVIEW_KEY = ['overview'] as const;

/** How often the Overview asks again while a run is in progress, in ms. */
const LIVE_INTERVAL = 2_000;

/** The Overview in one request; it keeps itself fresh while any run is queued or running. */
export function useOverview() {
  return useQuery({
    queryKey: OVERVIEW_KEY,
    queryFn: async () => (await apiFetch<{ overview: OverviewView }>('/overview')).overview,
    // Runs start elsewhere (Plans, schedules, the API): look again whenever the screen opens after a few seconds.
    staleTime: 5_000,
    refetchInterval: (query) => ((query.state.data?.inProgress.length ?? 0) > 0 ? LIVE_INTERVAL : false),
  });
}
