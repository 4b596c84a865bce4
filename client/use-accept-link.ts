import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PublicUser } from '../shared/public-user';
import type { UseLinkBody } from '../shared/schemas/use-link-body';
import { apiFetch } from './api-fetch';
import { resetSessionCache } from './reset-session-cache';

/** Uses a one-time link (sets the password, makes the invited account); the answer signs the person in. */
export function useAcceptLink() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: UseLinkBody) => apiFetch<{ user: PublicUser }>('/account-links/use', { method: 'POST', body }),
    onSuccess: ({ user }) => resetSessionCache(queryClient, user),
  });
}
