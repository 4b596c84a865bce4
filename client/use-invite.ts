import { useMutation } from '@tanstack/react-query';
import type { Role } from '../shared/roles';
import type { InviteBody } from '../shared/schemas/invite-body';
import { apiFetch } from './api-fetch';

/** Mails an invitation (a one-time link) to an address with a role. */
export function useInvite() {
  return useMutation({
    mutationFn: (body: InviteBody) =>
      apiFetch<{ invitation: { email: string; role: Role; expiresAt: string } }>('/users/invitations', {
        method: 'POST',
        body,
      }),
  });
}
