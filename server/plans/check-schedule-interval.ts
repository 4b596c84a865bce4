import { MIN_SCHEDULE_INTERVAL_MINUTES } from '../../shared/min-schedule-interval-minutes';
import { InputError } from '../http/input-error';
import { shortestCronGapSeconds } from './shortest-cron-gap-seconds';

/**
 * Refuses (400 naming `field`) a valid cron expression that would run a plan more often than
 * MIN_SCHEDULE_INTERVAL_MINUTES. Call after `nextCronRuns` has checked the expression.
 */
export function checkScheduleInterval(cron: string, field = 'body.cron'): void {
  const gap = shortestCronGapSeconds(cron);
  if (gap >= MIN_SCHEDULE_INTERVAL_MINUTES * 60) return;
  const apart = gap < 60 ? `${gap} s` : `${Math.round(gap / 60)} min`;
  throw new InputError([
    {
      field,
      rule: `must leave at least ${MIN_SCHEDULE_INTERVAL_MINUTES} min between runs (this one runs ${apart} apart)`,
    },
  ]);
}
