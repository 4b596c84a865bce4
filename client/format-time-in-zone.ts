/**
 * An instant as a person reads it in a given time zone, with how far away it is:
 * `Tue 14 Jan 2026, 02:30` and `in 7 h`. Falls back to UTC for a zone this runtime does not know.
 */
export function formatTimeInZone(
  iso: string,
  timeZone: string,
  now: Date = new Date(),
): { when: string; distance: string } {
  const at = new Date(iso);
  let zone = timeZone;
  try {
    new Intl.DateTimeFormat('en-GB', { timeZone: zone });
  } catch {
    zone = 'UTC';
  }
  // Built from parts: ICU versions (Node, Chromium) disagree on the commas of the whole string.
  const parts = new Intl.DateTimeFormat('en-GB', {
    timeZone: zone,
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
  }).formatToParts(at);
  const part = (type: Intl.DateTimeFormatPartTypes) => parts.find((p) => p.type === type)?.value ?? '';
  const when = `${part('weekday')} ${part('day')} ${part('month')} ${part('year')}, ${part('hour')}:${part('minute')}`;
  const minutes = Math.round((at.getTime() - now.getTime()) / 60_000);
  const span = Math.abs(minutes);
  const amount =
    span < 1
      ? 'less than a minute'
      : span < 60
        ? `${span} min`
        : span < 48 * 60
          ? `${Math.round(span / 60)} h`
          : `${Math.round(span / (24 * 60))} days`;
  return { when, distance: minutes >= 0 ? `in ${amount}` : `${amount} ago` };
}
