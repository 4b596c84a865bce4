import { keepPreviousData, useQuery } from '@tanstack/react-query';
import type { RunPropertyRow } from '../shared/run-property-row';
import { apiFetch } from './api-fetch';
import { runKey } from './use-run';

/** How often the property checks of a live run are asked for again, in ms. */
const LIVE_INTERVAL = 5_000;

/**
 * The property checks of a run: law, seed, and for a failure its shrunk counterexample; polled while
 * `live`, asked for nothing while `live` is undefined (the run itself is not known yet).
 */
export function useRunProperties(id: string, live: boolean | undefined) {
  return useQuery({
    // The run's own poll sees it end first, and the last poll of its property checks may be older than that:
    // a settled run's property checks are a query of their own, asked for when the run is seen to end (the
    // live ones stay on screen meanwhile), so a finished run never shows a half-done properties.
    queryKey: [...runKey(id), 'properties', live ? 'live' : 'settled'],
    enabled: live !== undefined,
    placeholderData: keepPreviousData,
    queryFn: async () => (await apiFetch<{ properties: RunPropertyRow[] }>(`/runs/${id}/properties`)).properties,
    refetchInterval: live ? LIVE_INTERVAL : false,
  });
}
