import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TargetSource } from '../shared/target-source';
import type { TargetSourceView } from '../shared/target-source-view';
import { apiFetch } from './api-fetch';
import { TARGET_SOURCES_KEY } from './use-target-sources';

/** Adds a target source (admins); the server answers at once and resolves it in the background. */
export function useAddTargetSource() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (source: TargetSource) =>
      apiFetch<{ source: TargetSourceView }>('/target-sources', { method: 'POST', body: source }),
    onSuccess: ({ source }) => {
      queryClient.setQueryData<TargetSourceView[]>(TARGET_SOURCES_KEY, (list) => (list ? [source, ...list] : list));
      void queryClient.invalidateQueries({ queryKey: TARGET_SOURCES_KEY });
    },
  });
}
