import type { Tolerance } from './schemas/tolerance-schema';

/** A tolerance in words, as results and suite pages show it: "4 ulps per part" or "relative error 1e-12". */
export function describeTolerance(tolerance: Tolerance): string {
  return 'ulps' in tolerance ? `${tolerance.ulps} ulps per part` : `relative error ${tolerance.relative}`;
}
