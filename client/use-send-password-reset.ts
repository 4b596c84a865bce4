import { useMutation } from '@tanstack/react-query';
import { apiFetch } from './api-fetch';

/** Mails a user a one-time link to choose a new password; answers where it went and until when it works. */
export function useSendPasswordReset() {
  return useMutation({
    mutationFn: (id: string) =>
      apiFetch<{ reset: { email: string; expiresAt: string } }>(`/users/${id}/password-reset`, { method: 'POST' }),
  });
}
