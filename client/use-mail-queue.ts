import { useQuery } from '@tanstack/react-query';
import type { OutboxMailView } from '../shared/outbox-mail-view';
import { apiFetch } from './api-fetch';

/** Mail Sheetkeeper queued that the relay has not (or not surely) accepted; refreshed every 10 s while shown. */
export function useMailQueue() {
  return useQuery({
    queryKey: ['outbox', 'queue'],
    queryFn: async () => (await apiFetch<{ mails: OutboxMailView[] }>('/outbox/queue')).mails,
    refetchInterval: 10_000,
  });
}
