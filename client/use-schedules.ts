import { useQuery } from '@tanstack/react-query';
import type { ScheduleView } from '../shared/schedule-view';
import { apiFetch } from './api-fetch';

export const SCHEDULES_KEY = ['schedules'] as const;

/** Every schedule of every plan, with the next times each fires. */
export function useSchedules() {
  return useQuery({
    queryKey: SCHEDULES_KEY,
    queryFn: async () => (await apiFetch<{ schedules: ScheduleView[] }>('/schedules')).schedules,
  });
}
