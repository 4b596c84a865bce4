import { shortestCronGapSeconds } from '../../../server/plans/shortest-cron-gap-seconds';

describe('shortestCronGapSeconds', () => {
  it.each([
    ['* * * * * *', 1],
    ['*/1 * * * *', 60],
    ['0,5,30 * * * *', 5 * 60],
    ['0 0,10 3 * * *', 10 * 60],
    ['*/15 * * * *', 15 * 60],
    ['0 */2 * * *', 2 * 3600],
    ['30 2 * * *', 24 * 3600],
    ['0 4 * * 1-5', 24 * 3600],
  ])('measures %s as %d s between runs', (cron, seconds) => {
    expect(shortestCronGapSeconds(cron)).toBe(seconds);
  });

  it('counts the gap across midnight when two days in a row fire', () => {
    // 23:59 one day, 00:00 the next.
    expect(shortestCronGapSeconds('0,59 0,23 * * *')).toBe(60);
  });

  it('ignores the gap across midnight when the next day never fires', () => {
    // Mondays only: the closest runs are 00:00 and 00:59 (or 23:00 and 23:59).
    expect(shortestCronGapSeconds('0,59 0,23 * * 1')).toBe(59 * 60);
  });

  it('answers one day for a gap of a day or more', () => {
    expect(shortestCronGapSeconds('15 3 * * 0')).toBe(24 * 3600);
    expect(shortestCronGapSeconds('0 0 1 * *')).toBe(24 * 3600);
  });
});
