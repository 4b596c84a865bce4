import { z } from 'zod';
import { textSchema } from './text-schema';

const DAY = /^(\d{4})-(\d{2})-(\d{2})$/;
/** What an API client sent before days were accepted, and still may: an ISO 8601 date and time with an offset. */
const DATE_TIME = z.iso.datetime({ offset: true });

/** The rule a badly written expiry states: in the words of the field, never a timestamp format. */
export const EXPIRY_DAY_RULE = 'must be a day written like 2027-01-31 (year-month-day)';

/** True when a YYYY-MM-DD names a day of the calendar (2027-02-30 does not). */
function isCalendarDay(text: string): boolean {
  const m = DAY.exec(text);
  if (!m) return false;
  const date = new Date(`${text}T00:00:00Z`);
  return !Number.isNaN(date.getTime()) && date.toISOString().slice(0, 10) === text;
}

/**
 * The day a decision expires, as the form asks for it ("2027-01-31"), becoming midnight UTC at
 * the start of that day; a date and time with an offset (what the API took before) is taken as
 * it is. The decision stops applying at that instant, so the day must lie after today (UTC):
 * today itself would be expired already. Used by the verdict form and the route alike.
 */
export const expiryDaySchema = textSchema(EXPIRY_DAY_RULE)
  .trim()
  .refine((t) => isCalendarDay(t) || DATE_TIME.safeParse(t).success, { error: EXPIRY_DAY_RULE, abort: true })
  .transform((t) => (DAY.test(t) ? `${t}T00:00:00Z` : t))
  .refine((t) => Date.parse(t) > Date.now(), { error: 'must be a day after today (UTC)' });
