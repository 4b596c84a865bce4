import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from './api-fetch';
import { SUBSCRIPTIONS_KEY } from './use-subscriptions';

type Subscriptions = { targetKeys: string[]; available: string[] };

/** Replaces my subscriptions, showing the new choice at once and rolling back if the server refuses. */
export function useSaveSubscriptions() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (targetKeys: string[]) =>
      apiFetch<{ targetKeys: string[] }>('/subscriptions', { method: 'PUT', body: { targetKeys } }),
    onMutate: async (targetKeys) => {
      await queryClient.cancelQueries({ queryKey: SUBSCRIPTIONS_KEY });
      const before = queryClient.getQueryData<Subscriptions>(SUBSCRIPTIONS_KEY);
      queryClient.setQueryData<Subscriptions>(SUBSCRIPTIONS_KEY, (old) => (old ? { ...old, targetKeys } : old));
      return { before };
    },
    onError: (_error, _vars, context) => {
      if (context?.before) queryClient.setQueryData(SUBSCRIPTIONS_KEY, context.before);
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: SUBSCRIPTIONS_KEY }),
  });
}
