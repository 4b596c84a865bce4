import { useQuery } from '@tanstack/react-query';
import type { PlanView } from '../shared/plan-view';
import { apiFetch } from './api-fetch';

export const PLANS_KEY = ['plans'] as const;

/** Every plan, by name. */
export function usePlans() {
  return useQuery({
    queryKey: PLANS_KEY,
    queryFn: async () => (await apiFetch<{ plans: PlanView[] }>('/plans')).plans,
  });
}
