import { useQuery, useQueryClient } from '@tanstack/react-query';
import type { PlanView } from '../shared/plan-view';
import { apiFetch } from './api-fetch';
import { PLANS_KEY } from './use-plans';

/** One plan; shows the copy from the plans list at once while the fresh one loads. */
export function usePlan(id: string) {
  const queryClient = useQueryClient();
  return useQuery({
    queryKey: [...PLANS_KEY, id],
    queryFn: async () => (await apiFetch<{ plan: PlanView }>(`/plans/${encodeURIComponent(id)}`)).plan,
    placeholderData: () => queryClient.getQueryData<PlanView[]>(PLANS_KEY)?.find((p) => p.id === id),
  });
}
