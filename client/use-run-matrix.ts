import { keepPreviousData, useQuery } from '@tanstack/react-query';
import type { RunMatrixCell } from '../shared/run-matrix-cell';
import { apiFetch } from './api-fetch';
import { runKey } from './use-run';

/** How often the matrix of a live run is asked for again, in ms: cells fill in as shards finish. */
const LIVE_INTERVAL = 2_500;

/**
 * The suite × target cells of a run; `live` (the run is queued or running) keeps them coming, and
 * `undefined` (the run itself is not known yet) asks for nothing.
 */
export function useRunMatrix(id: string, live: boolean | undefined) {
  return useQuery({
    // The run's own poll sees it end first, and the last poll of its cells may be older than that:
    // a settled run's cells are a query of their own, asked for when the run is seen to end (the
    // live ones stay on screen meanwhile), so a finished run never shows a half-done matrix.
    queryKey: [...runKey(id), 'matrix', live ? 'live' : 'settled'],
    enabled: live !== undefined,
    placeholderData: keepPreviousData,
    queryFn: async () => (await apiFetch<{ cells: RunMatrixCell[] }>(`/runs/${id}/matrix`)).cells,
    refetchInterval: live ? LIVE_INTERVAL : false,
  });
}
