/** A schedule as the API shows it, with the next three times it fires (ISO, UTC). */
export interface ScheduleView {
  id: string;
  planId: string;
  planName: string;
  cron: string;
  timeZone: string;
  enabled: boolean;
  nextRuns: string[];
}
