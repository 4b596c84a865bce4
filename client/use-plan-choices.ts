import { useQuery } from '@tanstack/react-query';
import type { SuiteSummary } from '../shared/suite-summary';
import { apiFetch } from './api-fetch';

/** What a plan may be made of: every suite (with its approved version, if any) and every known target. */
export function usePlanChoices() {
  return useQuery({
    queryKey: ['plan-choices'],
    queryFn: async () => {
      const [suites, targets] = await Promise.all([
        apiFetch<{ suites: SuiteSummary[] }>('/suites'),
        apiFetch<{ targets: { name: string; library: string; version: string; installed: boolean }[] }>('/targets'),
      ]);
      return { suites: suites.suites, targets: targets.targets };
    },
  });
}
