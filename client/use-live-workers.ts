import { useQuery } from '@tanstack/react-query';
import type { WorkerView } from '../shared/worker-view';
import { apiFetch } from './api-fetch';

/** How often the live workers are asked for again while a run is live, in ms (a worker beats every 5 s). */
const LIVE_INTERVAL = 5_000;

export const LIVE_WORKERS_KEY = ['workers'] as const;

/** The worker processes that are running now and the targets each takes; polled while `live`. */
export function useLiveWorkers(live: boolean) {
  return useQuery({
    queryKey: LIVE_WORKERS_KEY,
    queryFn: async () => (await apiFetch<{ workers: WorkerView[] }>('/workers')).workers,
    refetchInterval: live ? LIVE_INTERVAL : false,
  });
}
