import { useQuery } from '@tanstack/react-query';
import type { PublicUser } from '../shared/public-user';
import { apiFetch } from './api-fetch';

export const USERS_KEY = ['users'] as const;

export function useUsers() {
  return useQuery({
    queryKey: USERS_KEY,
    queryFn: async () => (await apiFetch<{ users: PublicUser[] }>('/users')).users,
  });
}
