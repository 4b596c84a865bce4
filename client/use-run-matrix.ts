import { useQuery } from '@tanstack/react-query';
import type { RunMatrixCell } from '../shared/run-matrix-cell';
import { apiFetch } from './api-fetch';
import { runKey } from './use-run';

/** How often the matrix of a live run is asked for again, in ms: cells fill in as shards finish. */
const LIVE_INTERVAL = 2_500;

/** The suite × target cells of a run; `live` (the run is queued or running) keeps them coming. */
export function useRunMatrix(id: string, live: boolean) {
  return useQuery({
    queryKey: [...runKey(id), 'matrix'],
    queryFn: async () => (await apiFetch<{ cells: RunMatrixCell[] }>(`/runs/${id}/matrix`)).cells,
    refetchInterval: live ? LIVE_INTERVAL : false,
  });
}
