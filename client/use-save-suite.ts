import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SuiteVersionView } from '../shared/suite-version-view';
import { apiFetch } from './api-fetch';
import { suiteKey } from './use-suite';
import { SUITES_KEY } from './use-suites';

/**
 * Saves a draft: `POST /api/suites` for a new suite, `PUT /api/suites/:slug` for an edit
 * (which changes the latest draft in place or starts the next version after an approved one).
 */
export function useSaveSuite(editing: string | null) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: unknown) =>
      (
        await apiFetch<{ version: SuiteVersionView }>(editing ? `/suites/${encodeURIComponent(editing)}` : '/suites', {
          method: editing ? 'PUT' : 'POST',
          body,
        })
      ).version,
    onSuccess: (version) => {
      void queryClient.invalidateQueries({ queryKey: SUITES_KEY });
      void queryClient.invalidateQueries({ queryKey: suiteKey(version.slug) });
    },
  });
}
