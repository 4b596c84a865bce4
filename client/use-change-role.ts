import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PublicUser } from '../shared/public-user';
import type { Role } from '../shared/roles';
import { apiFetch } from './api-fetch';
import { USERS_KEY } from './use-users';

/** Changes a user's role, showing the new role at once and rolling back if the server refuses. */
export function useChangeRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, role }: { id: string; role: Role }) =>
      apiFetch<{ user: PublicUser }>(`/users/${id}`, { method: 'PATCH', body: { role } }),
    onMutate: async ({ id, role }) => {
      await queryClient.cancelQueries({ queryKey: USERS_KEY });
      const before = queryClient.getQueryData<PublicUser[]>(USERS_KEY);
      queryClient.setQueryData<PublicUser[]>(USERS_KEY, (users) =>
        users?.map((u) => (u.id === id ? { ...u, role } : u)),
      );
      return { before };
    },
    onError: (_error, _vars, context) => {
      if (context?.before) queryClient.setQueryData(USERS_KEY, context.before);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: USERS_KEY }),
  });
}
