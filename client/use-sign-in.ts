import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PublicUser } from '../shared/public-user';
import type { SignInBody } from '../shared/schemas/sign-in-body';
import { apiFetch } from './api-fetch';
import { ME_KEY } from './use-me';

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SignInBody) => apiFetch<{ user: PublicUser }>('/auth/sign-in', { method: 'POST', body }),
    onSuccess: ({ user }) => {
      // Whatever was cached belonged to the previous session.
      queryClient.clear();
      queryClient.setQueryData(ME_KEY, user);
    },
  });
}
