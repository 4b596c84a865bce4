import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { DecisionView } from '../shared/decision-view';
import type { ClassifyBody } from '../shared/schemas/classify-body';
import { apiFetch } from './api-fetch';
import { DECISIONS_KEY } from './use-decisions';
import { FAILURES_KEY } from './use-failures';
import { failureKey } from './use-failure';

export interface ClassifyResult {
  deviation: DecisionView;
}

/** Records a verdict on a failure; the table's new/known/accepted status, its marks and the Decisions list change with it, so those are refetched. */
export function useClassifyFailure(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: ClassifyBody) =>
      apiFetch<ClassifyResult>(`/failures/${encodeURIComponent(id)}/classify`, { method: 'POST', body }),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: FAILURES_KEY }),
        queryClient.invalidateQueries({ queryKey: failureKey(id) }),
        queryClient.invalidateQueries({ queryKey: DECISIONS_KEY }),
      ]),
  });
}
