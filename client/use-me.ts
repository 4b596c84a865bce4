import { useQuery } from '@tanstack/react-query';
import type { PublicUser } from '../shared/public-user';
import { apiFetch } from './api-fetch';
import { ApiRequestError } from './api-request-error';

export const ME_KEY = ['me'] as const;

/** The signed-in user, or null when signed out (a 401 is an answer here, not an error). */
export function useMe() {
  return useQuery({
    queryKey: ME_KEY,
    queryFn: async (): Promise<PublicUser | null> => {
      try {
        return (await apiFetch<{ user: PublicUser }>('/me')).user;
      } catch (error) {
        if (error instanceof ApiRequestError && error.status === 401) return null;
        throw error;
      }
    },
  });
}
