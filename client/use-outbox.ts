import { useInfiniteQuery } from '@tanstack/react-query';
import type { ReceivedMailView } from '../shared/received-mail-view';
import { apiFetch } from './api-fetch';

const PAGE = 50;

/** What the local mail server received, newest first, a page at a time. */
export function useOutbox() {
  return useInfiniteQuery({
    queryKey: ['outbox'],
    initialPageParam: null as string | null,
    queryFn: ({ pageParam }) =>
      apiFetch<{ messages: ReceivedMailView[]; next: string | null }>(
        `/outbox?limit=${PAGE}${pageParam ? `&before=${encodeURIComponent(pageParam)}` : ''}`,
      ),
    getNextPageParam: (last) => last.next,
  });
}
