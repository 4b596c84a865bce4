import { useQuery } from '@tanstack/react-query';
import type { WorkerView } from '../shared/worker-view';
import { apiFetch } from './api-fetch';

/** How often the live workers are asked for again while they are shown, in ms (a worker beats every 5 s). */
const LIVE_INTERVAL = 5_000;

/** The worker processes that are running now and the targets each takes; polled while shown. */
export function useLiveWorkers() {
  return useQuery({
    queryKey: ['workers'],
    queryFn: async () => (await apiFetch<{ workers: WorkerView[] }>('/workers')).workers,
    refetchInterval: LIVE_INTERVAL,
  });
}
