import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ScheduleView } from '../shared/schedule-view';
import { apiFetch } from './api-fetch';
import { SCHEDULES_KEY } from './use-schedules';

/** Creates a schedule for a plan (no id) or changes its cron expression and time zone. */
export function useSaveSchedule(planId: string, id: string | null) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (body: { cron: string; timeZone: string }) =>
      (
        await apiFetch<{ schedule: ScheduleView }>(id ? `/schedules/${encodeURIComponent(id)}` : '/schedules', {
          method: id ? 'PATCH' : 'POST',
          body: id ? body : { ...body, planId, enabled: true },
        })
      ).schedule,
    onSuccess: (saved) => {
      queryClient.setQueryData<ScheduleView[]>(SCHEDULES_KEY, (list) =>
        list
          ? list.some((s) => s.id === saved.id)
            ? list.map((s) => (s.id === saved.id ? saved : s))
            : [...list, saved]
          : list,
      );
      void queryClient.invalidateQueries({ queryKey: SCHEDULES_KEY });
    },
  });
}
