import type { QueryClient } from '@tanstack/react-query';
import type { PublicUser } from '../shared/public-user';
import { ME_KEY } from './use-me';

/**
 * At sign-in and sign-out, everything cached belonged to the previous session.
 * `clear()` would drop the `me` query without telling its observers, leaving the
 * old user on screen, so drop the rest and set `me` in place.
 */
export function resetSessionCache(queryClient: QueryClient, me: PublicUser | null): void {
  queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== ME_KEY[0] });
  queryClient.setQueryData(ME_KEY, me);
}
