import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from './api-fetch';
import { resetSessionCache } from './reset-session-cache';

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch<void>('/auth/sign-out', { method: 'POST' }),
    onSuccess: () => resetSessionCache(queryClient, null),
  });
}
