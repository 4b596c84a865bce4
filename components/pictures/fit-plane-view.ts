import type { PlanePoint } from './plane-picture';

export interface PlaneView {
  minRe: number;
  maxRe: number;
  minIm: number;
  maxIm: number;
}

/**
 * A square-ish box around the given points with a 15% margin, never thinner than 1e-12, so a
 * straddle path at offsets of 1e-9 still shows as a picture rather than a single pixel column.
 */
export function fitPlaneView(points: PlanePoint[]): PlaneView {
  const finite = points.filter((p) => Number.isFinite(p.re) && Number.isFinite(p.im));
  if (finite.length === 0) return { minRe: -2, maxRe: 2, minIm: -2, maxIm: 2 };
  let minRe = Math.min(...finite.map((p) => p.re));
  let maxRe = Math.max(...finite.map((p) => p.re));
  let minIm = Math.min(...finite.map((p) => p.im));
  let maxIm = Math.max(...finite.map((p) => p.im));
  const span = Math.max(maxRe - minRe, maxIm - minIm, 1e-12);
  const margin = span * 0.15;
  minRe -= margin;
  maxRe += margin;
  minIm -= margin;
  maxIm += margin;
  if (maxRe - minRe < span) {
    const c = (minRe + maxRe) / 2;
    minRe = c - span / 2;
    maxRe = c + span / 2;
  }
  if (maxIm - minIm < span) {
    const c = (minIm + maxIm) / 2;
    minIm = c - span / 2;
    maxIm = c + span / 2;
  }
  return { minRe, maxRe, minIm, maxIm };
}
