import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from './api-fetch';
import { ME_KEY } from './use-me';

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch<void>('/auth/sign-out', { method: 'POST' }),
    onSuccess: () => {
      queryClient.clear();
      queryClient.setQueryData(ME_KEY, null);
    },
  });
}
