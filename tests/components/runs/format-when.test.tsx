import { formatDate } from '../../../client/format-date';
import { formatWhen } from '../../../components/runs/format-when';

describe('formatWhen', () => {
  const now = Date.parse('2026-02-03T14:05:00Z');

  it('says how long ago within the day', () => {
    expect(formatWhen('2026-02-03T14:04:50Z', now)).toBe('just now');
    expect(formatWhen('2026-02-03T13:53:00Z', now)).toBe('12 min ago');
    expect(formatWhen('2026-02-03T09:05:00Z', now)).toBe('5 h ago');
  });

  it('writes an older instant as the date lists use', () => {
    const iso = '2026-01-20T11:30:00Z';
    expect(formatWhen(iso, now)).toBe(formatDate(iso));
    expect(formatWhen(iso, now)).toMatch(/^20 Jan 2026, \d\d:\d\d$/);
  });
});
