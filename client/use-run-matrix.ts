import { useQuery } from '@tanstack/react-query';
import type { RunMatrixCell } from '../shared/run-matrix-cell';
import { apiFetch } from './api-fetch';
import { runKey } from './use-run';

/** How often the matrix of a live run is asked for again, in ms: cells fill in as shards finish. */
const LIVE_INTERVAL = 2_500;

/**
 * The suite × target cells of a run; `live` (from the run's own query, use-run.ts, which also
 * asks for them once more when the run ends) keeps them coming, and `undefined` (the run itself
 * is not known yet) asks for nothing.
 */
export function useRunMatrix(id: string, live: boolean | undefined) {
  return useQuery({
    queryKey: [...runKey(id), 'matrix'],
    enabled: live !== undefined,
    queryFn: async () => (await apiFetch<{ cells: RunMatrixCell[] }>(`/runs/${id}/matrix`)).cells,
    refetchInterval: live ? LIVE_INTERVAL : false,
  });
}
