import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SuiteVersionView } from '../shared/suite-version-view';
import { apiFetch } from './api-fetch';
import { suiteKey } from './use-suite';
import { SUITES_KEY } from './use-suites';

/** Submits a suite's latest draft for review; the version shows as submitted at once and rolls back if refused. */
export function useSubmitSuite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (slug: string) =>
      (await apiFetch<{ version: SuiteVersionView }>(`/suites/${encodeURIComponent(slug)}/submit`, { method: 'POST' }))
        .version,
    onMutate: async (slug) => {
      await queryClient.cancelQueries({ queryKey: suiteKey(slug) });
      const before = queryClient.getQueryData<SuiteVersionView[]>(suiteKey(slug));
      queryClient.setQueryData<SuiteVersionView[]>(suiteKey(slug), (versions) =>
        versions?.map((v, i) => (i === 0 ? { ...v, status: 'submitted', submittedAt: new Date().toISOString() } : v)),
      );
      return { before };
    },
    onError: (_error, slug, context) => {
      if (context?.before) queryClient.setQueryData(suiteKey(slug), context.before);
    },
    onSettled: (_data, _error, slug) => {
      void queryClient.invalidateQueries({ queryKey: SUITES_KEY });
      void queryClient.invalidateQueries({ queryKey: suiteKey(slug) });
    },
  });
}
