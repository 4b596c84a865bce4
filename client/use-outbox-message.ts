import { useQuery } from '@tanstack/react-query';
import type { ReceivedMailView } from '../shared/received-mail-view';
import { apiFetch } from './api-fetch';

/** One received message with its plain-text and HTML parts. */
export function useOutboxMessage(id: string) {
  return useQuery({
    queryKey: ['outbox', 'message', id],
    queryFn: async () => (await apiFetch<{ message: ReceivedMailView }>(`/outbox/${encodeURIComponent(id)}`)).message,
  });
}
