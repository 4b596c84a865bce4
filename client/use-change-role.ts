import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PublicUser } from '../shared/public-user';
import type { Role } from '../shared/roles';
import { apiFetch } from './api-fetch';
import { replaceUser } from './replace-user';

/**
 * Changes one user's role. Not optimistic: the row says "saved" only once the server has the
 * new role, and a refusal (the last active admin) leaves the old one shown beside its reason.
 */
export function useChangeRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, role }: { id: string; role: Role }) =>
      apiFetch<{ user: PublicUser }>(`/users/${id}`, { method: 'PATCH', body: { role } }),
    onSuccess: ({ user }) => replaceUser(queryClient, user),
  });
}
