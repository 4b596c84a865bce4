import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ReviewBody } from '../shared/schemas/review-body';
import type { SuiteVersionView } from '../shared/suite-version-view';
import { apiFetch } from './api-fetch';
import { SUITES_KEY } from './use-suites';

/** Approves a submitted version or requests changes with a comment (the server refuses self-review). */
export function useReviewSuite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ slug, version, body }: { slug: string; version: number; body: ReviewBody }) =>
      (
        await apiFetch<{ version: SuiteVersionView }>(
          `/suites/${encodeURIComponent(slug)}/versions/${version}/review`,
          { method: 'POST', body },
        )
      ).version,
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: SUITES_KEY }),
  });
}
