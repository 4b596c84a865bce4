import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TokenView } from '../shared/token-view';
import { apiFetch } from './api-fetch';
import { TOKENS_KEY } from './use-tokens';

/** Creates a token; the answer carries the secret, which exists only in this answer. */
export function useCreateToken() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (name: string) =>
      apiFetch<{ token: TokenView; secret: string }>('/tokens', { method: 'POST', body: { name } }),
    onSuccess: ({ token }) => {
      queryClient.setQueryData<TokenView[]>(TOKENS_KEY, (list) => (list ? [token, ...list] : list));
      void queryClient.invalidateQueries({ queryKey: TOKENS_KEY });
    },
  });
}
