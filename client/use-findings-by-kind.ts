import { useQuery } from '@tanstack/react-query';
import type { FindingsByKindView } from '../shared/findings-by-kind-view';
import { findingsByKindQuery } from '../shared/schemas/findings-by-kind-query';
import { apiFetch } from './api-fetch';
import { findingsByKindKey } from './findings-by-kind-key';

/**
 * A plan's findings by kind across its latest completed runs (`runs` of them, checked with the
 * server's own schema before it is sent). Runs complete elsewhere: it asks again when the screen
 * opens after a minute, and at once after a run of the plan was seen to finish (`useRun`).
 */
export function useFindingsByKind(planId: string, runs?: number) {
  const query = findingsByKindQuery.parse({ runs });
  return useQuery({
    queryKey: [...findingsByKindKey(planId), query.runs],
    queryFn: () =>
      apiFetch<FindingsByKindView>(
        `/plans/${encodeURIComponent(planId)}/findings-by-kind?${new URLSearchParams({ runs: String(query.runs) }).toString()}`,
      ),
    staleTime: 60_000,
  });
}
