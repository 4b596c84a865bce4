import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ScheduleView } from '../shared/schedule-view';
import { apiFetch } from './api-fetch';
import { SCHEDULES_KEY } from './use-schedules';

/** Deletes a schedule; the plan stays. */
export function useDeleteSchedule() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => apiFetch<void>(`/schedules/${encodeURIComponent(id)}`, { method: 'DELETE' }),
    onSuccess: (_void, id) => {
      queryClient.setQueryData<ScheduleView[]>(SCHEDULES_KEY, (list) => list?.filter((s) => s.id !== id));
      void queryClient.invalidateQueries({ queryKey: SCHEDULES_KEY });
    },
  });
}
