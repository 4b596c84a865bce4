/** Wait after the n-th failed delivery attempt: 15 s · 2^(n−1), at most an hour (15 s, 30 s, 1 min, … 1 h). */
export function backoffSeconds(attempts: number): number {
  return Math.min(3600, 15 * 2 ** Math.max(0, attempts - 1));
}
