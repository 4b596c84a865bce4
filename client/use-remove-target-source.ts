import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from './api-fetch';
import { TARGET_SOURCES_KEY } from './use-target-sources';
import { TARGETS_KEY } from './use-targets';

/** Removes an added target source (admins); its targets turn "not installed" in the targets list. */
export function useRemoveTargetSource() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => apiFetch<void>(`/target-sources/${id}`, { method: 'DELETE' }),
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: TARGET_SOURCES_KEY }),
        queryClient.invalidateQueries({ queryKey: TARGETS_KEY }),
      ]),
  });
}
