import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ScheduleView } from '../shared/schedule-view';
import { apiFetch } from './api-fetch';
import { SCHEDULES_KEY } from './use-schedules';

/** Turns a schedule on or off, showing the new state at once and rolling back if the server refuses. */
export function useToggleSchedule() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ id, enabled }: { id: string; enabled: boolean }) =>
      (
        await apiFetch<{ schedule: ScheduleView }>(`/schedules/${encodeURIComponent(id)}`, {
          method: 'PATCH',
          body: { enabled },
        })
      ).schedule,
    onMutate: async ({ id, enabled }) => {
      await queryClient.cancelQueries({ queryKey: SCHEDULES_KEY });
      const before = queryClient.getQueryData<ScheduleView[]>(SCHEDULES_KEY);
      queryClient.setQueryData<ScheduleView[]>(SCHEDULES_KEY, (list) =>
        list?.map((s) => (s.id === id ? { ...s, enabled } : s)),
      );
      return { before };
    },
    onError: (_error, _vars, context) => {
      if (context?.before) queryClient.setQueryData(SCHEDULES_KEY, context.before);
    },
    onSuccess: (saved) => {
      queryClient.setQueryData<ScheduleView[]>(SCHEDULES_KEY, (list) =>
        list?.map((s) => (s.id === saved.id ? saved : s)),
      );
    },
    onSettled: () => queryClient.invalidateQueries({ queryKey: SCHEDULES_KEY }),
  });
}
