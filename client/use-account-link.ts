import { useQuery } from '@tanstack/react-query';
import type { AccountLinkView } from '../shared/account-link-view';
import { apiFetch } from './api-fetch';

/**
 * What the one-time link `token` is (an invitation or a reset), asked once: a link that cannot be
 * used is an answer (410 with the reason), not something to retry.
 */
export function useAccountLink(token: string | null) {
  return useQuery({
    queryKey: ['account-link', token],
    enabled: token !== null,
    retry: false,
    staleTime: Infinity,
    queryFn: async () =>
      (await apiFetch<{ link: AccountLinkView }>('/account-links/lookup', { method: 'POST', body: { token } })).link,
  });
}
