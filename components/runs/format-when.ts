import { formatDate } from '../../client/format-date';

/**
 * When something happened, relative to `now` for the recent past ("just now", "12 min ago",
 * "5 h ago") and as a date after a day ("3 Feb 2026, 14:05", in the device's zone).
 */
export function formatWhen(iso: string, now: number = Date.now()): string {
  const then = new Date(iso).getTime();
  const minutes = Math.round((now - then) / 60_000);
  if (minutes < 1) return 'just now';
  if (minutes < 60) return `${minutes} min ago`;
  if (minutes < 24 * 60) return `${Math.round(minutes / 60)} h ago`;
  return formatDate(iso);
}
