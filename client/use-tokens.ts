import { useQuery } from '@tanstack/react-query';
import type { TokenView } from '../shared/token-view';
import { apiFetch } from './api-fetch';

export const TOKENS_KEY = ['tokens'] as const;

/** My API tokens, newest first (never their secrets). */
export function useTokens() {
  return useQuery({
    queryKey: TOKENS_KEY,
    queryFn: async () => (await apiFetch<{ tokens: TokenView[] }>('/tokens')).tokens,
  });
}
