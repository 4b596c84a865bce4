import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PublicUser } from '../shared/public-user';
import { apiFetch } from './api-fetch';
import { replaceUser } from './replace-user';

/** Deactivates (`active: false`) or reactivates one user. */
export function useSetUserActive() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, active }: { id: string; active: boolean }) =>
      apiFetch<{ user: PublicUser }>(`/users/${id}/${active ? 'reactivate' : 'deactivate'}`, { method: 'POST' }),
    onSuccess: ({ user }) => replaceUser(queryClient, user),
  });
}
