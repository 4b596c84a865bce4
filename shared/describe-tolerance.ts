import type { Tolerance } from './schemas/tolerance-schema';

const ulpsText = (t: { ulps: number }) => `${t.ulps} ulps per part`;
/** A whole multiple of eps = 2^−52 is named as one too: "relative error 8.881784197001252e-16 (4 eps)". */
const relativeText = (t: { relative: number }) => {
  const eps = t.relative / Number.EPSILON;
  return `relative error ${t.relative}${Number.isInteger(eps) && eps <= 1024 ? ` (${eps} eps)` : ''}`;
};

/** A tolerance in words, as results and suite pages show it: "4 ulps per part", "relative error 1e-12", or both joined by "or". */
export function describeTolerance(tolerance: Tolerance): string {
  if ('ulps' in tolerance && 'relative' in tolerance) return `${ulpsText(tolerance)} or ${relativeText(tolerance)}`;
  return 'ulps' in tolerance ? ulpsText(tolerance) : relativeText(tolerance);
}
