import { useQuery } from '@tanstack/react-query';
import { apiFetch } from './api-fetch';

export const SUBSCRIPTIONS_KEY = ['subscriptions'] as const;

/** The libraries whose regressions mail me, and the libraries one can choose from. */
export function useSubscriptions() {
  return useQuery({
    queryKey: SUBSCRIPTIONS_KEY,
    queryFn: () => apiFetch<{ targetKeys: string[]; available: string[] }>('/subscriptions'),
  });
}
