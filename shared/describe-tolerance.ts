import type { Tolerance } from './schemas/tolerance-schema';

const ulpsText = (t: { ulps: number }) => `${t.ulps} ulps per part`;
const relativeText = (t: { relative: number }) => `relative error ${t.relative}`;

/** A tolerance in words, as results and suite pages show it: "4 ulps per part", "relative error 1e-12", or both joined by "or". */
export function describeTolerance(tolerance: Tolerance): string {
  if ('ulps' in tolerance && 'relative' in tolerance) return `${ulpsText(tolerance)} or ${relativeText(tolerance)}`;
  return 'ulps' in tolerance ? ulpsText(tolerance) : relativeText(tolerance);
}
