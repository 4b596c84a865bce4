import { useInfiniteQuery } from '@tanstack/react-query';
import type { DecisionMark } from '../shared/decision-mark';
import type { FailureView } from '../shared/failure-view';
import { apiFetch } from './api-fetch';
import type { FailureFilters } from './failure-filters';
import { failureQueryString } from './failure-query-string';

export const FAILURES_KEY = ['failures'] as const;
/** Rows per page: a screenful on a wide screen, a few thumbs of scrolling on a phone. */
export const FAILURES_PAGE = 50;

/** The failure table, one keyed page at a time (with the decision in force on each row that has one): each page's `next` cursor asks for the one after it. */
export function useFailures(filters: FailureFilters) {
  return useInfiniteQuery({
    queryKey: [...FAILURES_KEY, filters],
    initialPageParam: null as string | null,
    queryFn: ({ pageParam }) =>
      apiFetch<{ failures: FailureView[]; next: string | null; decisions: Record<string, DecisionMark> }>(
        `/failures?${failureQueryString(filters, { after: pageParam, limit: FAILURES_PAGE })}`,
      ),
    getNextPageParam: (last) => last.next,
  });
}
