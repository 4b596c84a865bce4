import { useQuery } from '@tanstack/react-query';
import type { RunPropertyRow } from '../shared/run-property-row';
import { apiFetch } from './api-fetch';
import { runKey } from './use-run';

/** How often the property checks of a live run are asked for again, in ms. */
const LIVE_INTERVAL = 5_000;

/**
 * The property checks of a run: law, seed, and for a failure its shrunk counterexample; polled while
 * `live` (from the run's own query, use-run.ts, which also asks for them once more when the run
 * ends), asked for nothing while `live` is undefined (the run itself is not known yet).
 */
export function useRunProperties(id: string, live: boolean | undefined) {
  return useQuery({
    queryKey: [...runKey(id), 'properties'],
    enabled: live !== undefined,
    queryFn: async () => (await apiFetch<{ properties: RunPropertyRow[] }>(`/runs/${id}/properties`)).properties,
    refetchInterval: live ? LIVE_INTERVAL : false,
  });
}
