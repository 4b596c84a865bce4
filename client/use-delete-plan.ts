import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from './api-fetch';
import { PLANS_KEY } from './use-plans';

/** Deletes a plan (its schedules go with it). */
export function useDeletePlan() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => apiFetch<void>(`/plans/${encodeURIComponent(id)}`, { method: 'DELETE' }),
    onSuccess: (_void, id) => {
      queryClient.removeQueries({ queryKey: [...PLANS_KEY, id] });
      void queryClient.invalidateQueries({ queryKey: PLANS_KEY, exact: true });
      void queryClient.invalidateQueries({ queryKey: ['schedules'] });
    },
  });
}
