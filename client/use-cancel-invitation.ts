import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CancelledInvitation } from '../shared/cancelled-invitation';
import { apiFetch } from './api-fetch';
import { INVITATIONS_KEY } from './use-invitations';

/** Names the withdrawals, so the invitation form can tell that the invitation it just sent was withdrawn. */
export const CANCEL_INVITATION_KEY = ['cancel-invitation'] as const;

/**
 * Withdraws an open invitation by its id. The open invitations are read again whatever the
 * answer: after a refusal (used or expired meanwhile) the list shows what is really open.
 */
export function useCancelInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: CANCEL_INVITATION_KEY,
    mutationFn: (id: string) =>
      apiFetch<{ invitation: CancelledInvitation }>(`/users/invitations/${id}/cancel`, { method: 'POST' }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: INVITATIONS_KEY }),
  });
}
