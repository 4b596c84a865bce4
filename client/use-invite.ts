import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Role } from '../shared/roles';
import type { InviteBody } from '../shared/schemas/invite-body';
import { apiFetch } from './api-fetch';
import { INVITATIONS_KEY } from './use-invitations';

/** Mails an invitation (a one-time link) to an address with a role; the open invitations are read again. */
export function useInvite() {
  const queryClient = useQueryClient();
  return useMutation({
    onSuccess: () => queryClient.invalidateQueries({ queryKey: INVITATIONS_KEY }),
    mutationFn: (body: InviteBody) =>
      apiFetch<{ invitation: { email: string; role: Role; expiresAt: string } }>('/users/invitations', {
        method: 'POST',
        body,
      }),
  });
}
