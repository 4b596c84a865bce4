import { useQuery } from '@tanstack/react-query';
import type { InvitationView } from '../shared/invitation-view';
import { apiFetch } from './api-fetch';

export const INVITATIONS_KEY = ['invitations'] as const;

/** Invitations that can still be used, newest first (admins). */
export function useInvitations() {
  return useQuery({
    queryKey: INVITATIONS_KEY,
    queryFn: async () => (await apiFetch<{ invitations: InvitationView[] }>('/users/invitations')).invitations,
  });
}
