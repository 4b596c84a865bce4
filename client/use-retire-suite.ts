import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SuiteVersionView } from '../shared/suite-version-view';
import { apiFetch } from './api-fetch';
import { SUITES_KEY } from './use-suites';

/** Retires an approved version: plans stop using it; the version and its results stay. */
export function useRetireSuite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ slug, version }: { slug: string; version: number }) =>
      (
        await apiFetch<{ version: SuiteVersionView }>(
          `/suites/${encodeURIComponent(slug)}/versions/${version}/retire`,
          { method: 'POST' },
        )
      ).version,
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: SUITES_KEY }),
  });
}
