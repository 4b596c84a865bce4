import type { PlanePoint } from './plane-picture';

/** A cut as drawn: a polyline whose last segment goes on to infinity when `toInfinity`. */
export interface PlaneCut {
  points: PlanePoint[];
  toInfinity: boolean;
}

/**
 * The point of the given cuts nearest to `p`, or null when no cut has two finite points. Each
 * segment is clamped to its ends; a cut's last segment going to infinity is clamped at its start
 * only. Differences are taken before squaring so that points 1e-300 apart near −0.5 still have a
 * non-zero distance.
 */
export function nearestPointOnCuts(cuts: PlaneCut[], p: PlanePoint): PlanePoint | null {
  let best: PlanePoint | null = null;
  let bestDistance = Infinity;
  for (const cut of cuts) {
    const pts = cut.points.filter((q) => Number.isFinite(q.re) && Number.isFinite(q.im));
    for (let i = 1; i < pts.length; i++) {
      const a = pts[i - 1]!;
      const b = pts[i]!;
      const ray = cut.toInfinity && i === pts.length - 1;
      const q = closestOnSegment(a, b, p, ray);
      const d = Math.hypot(p.re - q.re, p.im - q.im);
      if (d < bestDistance) {
        bestDistance = d;
        best = q;
      }
    }
  }
  return best;
}

function closestOnSegment(a: PlanePoint, b: PlanePoint, p: PlanePoint, ray: boolean): PlanePoint {
  const dRe = b.re - a.re;
  const dIm = b.im - a.im;
  const length = Math.hypot(dRe, dIm);
  if (length === 0) return a;
  // Along the unit direction, so a segment of length 1e6 and an offset of 1e-300 stay in range.
  const uRe = dRe / length;
  const uIm = dIm / length;
  let s = (p.re - a.re) * uRe + (p.im - a.im) * uIm;
  s = Math.max(0, ray ? s : Math.min(length, s));
  // On an axis-parallel cut the point keeps the cut's own coordinate exactly (−0.5 + 0i, not −0.5 + 1e-17i).
  return { re: uRe === 0 ? a.re : a.re + s * uRe, im: uIm === 0 ? a.im : a.im + s * uIm };
}
