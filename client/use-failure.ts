import { useQuery } from '@tanstack/react-query';
import type { FailureDetailView } from '../shared/failure-detail-view';
import { apiFetch } from './api-fetch';

export const failureKey = (id: string) => ['failure', id] as const;

/** One failure in full, with the same point's history across runs and versions. */
export function useFailure(id: string) {
  return useQuery({
    queryKey: failureKey(id),
    queryFn: () => apiFetch<FailureDetailView>(`/failures/${encodeURIComponent(id)}`),
  });
}
