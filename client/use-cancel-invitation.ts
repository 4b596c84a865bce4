import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CancelledInvitation } from '../shared/cancelled-invitation';
import { apiFetch } from './api-fetch';
import { INVITATIONS_KEY } from './use-invitations';

/**
 * Withdraws an open invitation by its id. The open invitations are read again whatever the
 * answer: after a refusal (used or expired meanwhile) the list shows what is really open.
 */
export function useCancelInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) =>
      apiFetch<{ invitation: CancelledInvitation }>(`/users/invitations/${id}/cancel`, { method: 'POST' }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: INVITATIONS_KEY }),
  });
}
