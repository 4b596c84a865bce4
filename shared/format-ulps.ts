/** Ulps as people read them: whole numbers below a million, then powers of ten. */
export function formatUlps(ulps: number | null): string {
  if (ulps === null || !Number.isFinite(ulps)) return '—';
  return ulps < 1e6 ? String(Math.round(ulps)) : ulps.toExponential(1);
}
