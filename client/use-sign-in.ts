import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PublicUser } from '../shared/public-user';
import type { SignInBody } from '../shared/schemas/sign-in-body';
import { apiFetch } from './api-fetch';
import { resetSessionCache } from './reset-session-cache';

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SignInBody) => apiFetch<{ user: PublicUser }>('/auth/sign-in', { method: 'POST', body }),
    onSuccess: ({ user }) => resetSessionCache(queryClient, user),
  });
}
