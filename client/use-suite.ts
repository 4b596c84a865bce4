import { useQuery } from '@tanstack/react-query';
import type { SuiteVersionView } from '../shared/suite-version-view';
import { apiFetch } from './api-fetch';
import { SUITES_KEY } from './use-suites';

export const suiteKey = (slug: string) => [...SUITES_KEY, 'one', slug] as const;

/** Every version of one suite, newest first. */
export function useSuite(slug: string | undefined) {
  return useQuery({
    queryKey: suiteKey(slug ?? ''),
    queryFn: async () =>
      (await apiFetch<{ versions: SuiteVersionView[] }>(`/suites/${encodeURIComponent(slug ?? '')}`)).versions,
    enabled: Boolean(slug),
  });
}
