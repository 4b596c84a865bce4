import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PlanView } from '../shared/plan-view';
import type { PlanBody } from '../shared/schemas/plan-body';
import { apiFetch } from './api-fetch';
import { PLANS_KEY } from './use-plans';

/** Creates a plan (no id) or replaces one; the lists and the plan's own query get the answer. */
export function useSavePlan(id: string | null) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: PlanBody) =>
      (
        await apiFetch<{ plan: PlanView }>(id ? `/plans/${encodeURIComponent(id)}` : '/plans', {
          method: id ? 'PUT' : 'POST',
          body,
        })
      ).plan,
    onSuccess: (plan) => {
      queryClient.setQueryData([...PLANS_KEY, plan.id], plan);
      void queryClient.invalidateQueries({ queryKey: PLANS_KEY, exact: true });
      // Schedules carry the plan's name.
      void queryClient.invalidateQueries({ queryKey: ['schedules'] });
    },
  });
}
