/**
 * Where a distance r from the picture's centre is drawn, as a fraction of the picture's radius:
 * 0 for r = 0, then from INNER at 10^lo to 1 at 10^hi, linear in log10 r (and in log10 r from just under the least subnormal below 10^lo). Strictly increasing
 * in r (the law the picture relies on: nearer is drawn nearer), unclamped, so a point farther
 * than 10^hi lies outside the picture rather than on its edge.
 */
export interface LogDistanceScale {
  /** Decades shown: 10^lo is the least distance drawn apart from the centre, 10^hi the rim. */
  lo: number;
  hi: number;
  radius(r: number): number;
}

/**
 * The innermost decade sits this far out, so a point exactly at the centre (on the cut, r = 0)
 * stays apart from one 5e-324 away.
 */
const INNER = 0.08;
/** Below log10 of the least subnormal (5e-324, log10 ≈ −323.3). */
const LEAST = -325;

export function logDistanceScale(lo: number, hi: number): LogDistanceScale {
  const decades = Math.max(1, hi - lo);
  // 10^-324 rounds to 0, and no positive double lies below it: the log branch covers them all.
  const floor = 10 ** lo;
  return {
    lo,
    hi: lo + decades,
    radius: (r) => {
      if (!(r > 0)) return 0;
      // Below the innermost decade (a cut drawn past the nearest point): inside INNER, still log and
      // increasing, reaching 0 just under the least subnormal (a linear r / 10^lo underflows to 0 there).
      if (r < floor) return (INNER * (Math.log10(r) - LEAST)) / (lo - LEAST);
      return INNER + ((1 - INNER) * (Math.log10(r) - lo)) / decades;
    },
  };
}
