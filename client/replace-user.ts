import type { QueryClient } from '@tanstack/react-query';
import type { PublicUser } from '../shared/public-user';
import { USERS_KEY } from './use-users';

/** Puts the server's answer for one user into the users list, then refetches it in the background. */
export function replaceUser(queryClient: QueryClient, user: PublicUser): Promise<void> {
  queryClient.setQueryData<PublicUser[]>(USERS_KEY, (users) => users?.map((u) => (u.id === user.id ? user : u)));
  return queryClient.invalidateQueries({ queryKey: USERS_KEY });
}
