import { useQuery } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { cronPreviewBody } from '../shared/schemas/schedule-body';
import { apiFetch } from './api-fetch';
import { serverFieldErrors } from './server-field-errors';

/** Typing pauses longer than this ask the server; shorter ones would ask once per key. */
const SETTLE_MS = 300;

export interface SchedulePreview {
  /** The next three times (ISO, UTC) for the expression as typed, once known. */
  nextRuns: string[] | null;
  /** Broken rules of `cron` and `timeZone`, from the shared schema or from the server's field-by-field check. */
  issues: { cron?: string; timeZone?: string };
  /** The server is being asked, or the typing has not settled yet. */
  working: boolean;
}

/**
 * The next run times of a cron expression as it is typed: the shared schema first (nothing is
 * sent for an expression it refuses), then `POST /api/schedules/preview`, which checks each field.
 */
export function useSchedulePreview(cron: string, timeZone: string): SchedulePreview {
  const [settled, setSettled] = useState({ cron, timeZone });
  useEffect(() => {
    const timer = setTimeout(() => setSettled({ cron, timeZone }), SETTLE_MS);
    return () => clearTimeout(timer);
  }, [cron, timeZone]);

  const parsed = cronPreviewBody.safeParse(settled);
  const clientIssues: SchedulePreview['issues'] = {};
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const field = issue.path[0];
      if ((field === 'cron' || field === 'timeZone') && !clientIssues[field]) clientIssues[field] = issue.message;
    }
  }
  const query = useQuery({
    queryKey: ['schedule-preview', parsed.data?.cron, parsed.data?.timeZone],
    queryFn: async () =>
      (await apiFetch<{ nextRuns: string[] }>('/schedules/preview', { method: 'POST', body: parsed.data })).nextRuns,
    enabled: parsed.success,
    staleTime: 60_000,
    retry: false,
  });
  const fromServer = serverFieldErrors(query.error);
  const typing = settled.cron !== cron || settled.timeZone !== timeZone;
  return {
    nextRuns: parsed.success && query.data ? query.data : null,
    issues: parsed.success ? { cron: fromServer.cron, timeZone: fromServer.timeZone } : clientIssues,
    working: typing || (parsed.success && query.isFetching),
  };
}
