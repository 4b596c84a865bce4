import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ClassifyBody } from '../shared/schemas/classify-body';
import { apiFetch } from './api-fetch';
import { FAILURES_KEY } from './use-failures';
import { failureKey } from './use-failure';

export interface ClassifyResult {
  deviation: {
    id: string;
    classification: ClassifyBody['classification'];
    scope: ClassifyBody['scope'];
    expiresAt: string | null;
  };
}

/** Records a verdict on a failure; the table's new/known/accepted status changes with it, so those pages are refetched. */
export function useClassifyFailure(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ClassifyBody) =>
      apiFetch<ClassifyResult>(`/failures/${encodeURIComponent(id)}/classify`, { method: 'POST', body }),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: FAILURES_KEY }),
        queryClient.invalidateQueries({ queryKey: failureKey(id) }),
      ]),
  });
}
