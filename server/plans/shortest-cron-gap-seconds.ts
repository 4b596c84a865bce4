import { createTask, parse } from 'node-cron';

const DAY_SECONDS = 24 * 3600;
const DAY_MS = DAY_SECONDS * 1000;
/** 28 years: the Gregorian calendar's weekdays and leap days repeat (between centuries) after that. */
const SCAN_DAYS = 10_227;

/**
 * The shortest time in seconds between two consecutive firings of a valid cron expression (5 or 6
 * fields), from the times it really fires rather than from its text: `*\/1`, lists, ranges and a
 * seconds field all count. Gaps of a day or more are all answered as one day (86,400 s): the
 * minimum interval is far below that, and weekly or monthly gaps would cost a calendar walk.
 *
 * Every firing day fires at the same times of day, so the gap is the shorter of the gaps between
 * those times and the gap from the last to the first across midnight, which counts only when two
 * calendar days in a row fire. That is looked up with node-cron's own matcher over 28 years, and
 * only when the gap across midnight would be the shortest (an expression that fires both late and
 * early in the day): 1 day for a daily one, ~250 ms measured for one that fires only on 29 February.
 * Clock changes are ignored: they shift a firing by an hour at most twice a year.
 */
export function shortestCronGapSeconds(cron: string): number {
  const fields = parse(cron);
  const times: number[] = [];
  for (const h of fields.hour)
    for (const m of fields.minute) for (const s of fields.second) times.push(h * 3600 + m * 60 + s);
  times.sort((a, b) => a - b);
  let shortest = DAY_SECONDS;
  for (let i = 1; i < times.length; i += 1) shortest = Math.min(shortest, times[i]! - times[i - 1]!);
  const acrossMidnight = DAY_SECONDS - times[times.length - 1]! + times[0]!;
  if (acrossMidnight < shortest && firesOnConsecutiveDays(cron, times[0]!)) shortest = acrossMidnight;
  return shortest;
}

function firesOnConsecutiveDays(cron: string, firstTime: number): boolean {
  // UTC: which calendar days fire does not depend on the zone.
  const task = createTask(cron, () => undefined, { timezone: 'UTC' });
  try {
    const start = Date.UTC(2024, 0, 1) + firstTime * 1000;
    let previous = false;
    for (let day = 0; day < SCAN_DAYS; day += 1) {
      const fires = task.match(new Date(start + day * DAY_MS));
      if (fires && previous) return true;
      previous = fires;
    }
    return false;
  } finally {
    void task.destroy();
  }
}
