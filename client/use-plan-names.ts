import { useQuery } from '@tanstack/react-query';
import type { PlanView } from '../shared/plan-view';
import { apiFetch } from './api-fetch';

/**
 * Every plan's id and name, for filters. Shares the `['plans']` cache entry (the whole plans)
 * with the Plans screen, so opening one warms the other.
 */
export function usePlanNames() {
  return useQuery({
    queryKey: ['plans'],
    queryFn: async () => (await apiFetch<{ plans: PlanView[] }>('/plans')).plans,
    select: (plans) => plans.map((p) => ({ id: p.id, name: p.name })),
  });
}
