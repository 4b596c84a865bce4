import { useQuery } from '@tanstack/react-query';
import type { FailurePathView } from '../shared/failure-path-view';
import { apiFetch } from './api-fetch';

/** The case's path point by point, for the plane picture and the plots along it. A run's path never changes, so it is not refetched. */
export function useFailurePath(id: string) {
  return useQuery({
    queryKey: ['failure-path', id],
    queryFn: () => apiFetch<FailurePathView>(`/failures/${encodeURIComponent(id)}/path`),
    staleTime: Infinity,
  });
}
