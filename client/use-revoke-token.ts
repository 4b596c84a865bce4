import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TokenView } from '../shared/token-view';
import { apiFetch } from './api-fetch';
import { TOKENS_KEY } from './use-tokens';

/** Revokes a token; it stops working at once and stays listed as revoked. */
export function useRevokeToken() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (id: string) =>
      (await apiFetch<{ token: TokenView }>(`/tokens/${encodeURIComponent(id)}/revoke`, { method: 'POST' })).token,
    onSuccess: (token) => {
      queryClient.setQueryData<TokenView[]>(TOKENS_KEY, (list) => list?.map((t) => (t.id === token.id ? token : t)));
      void queryClient.invalidateQueries({ queryKey: TOKENS_KEY });
    },
  });
}
