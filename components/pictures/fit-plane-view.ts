import { logDistanceScale } from './log-distance-scale';
import { nearestPointOnCuts, type PlaneCut } from './nearest-point-on-cuts';
import type { PlanePoint } from './plane-picture';

/** A box in the units a fit draws in (see PlaneFit). */
export interface PlaneView {
  minRe: number;
  maxRe: number;
  minIm: number;
  maxIm: number;
}

/** What a picture must show: `points` all in view; branch points and cuts placed around them. */
export interface PlaneFitInput {
  points: PlanePoint[];
  branchPoints?: PlanePoint[];
  cuts?: PlaneCut[];
  /** Where the reader looks (the case); the middle of the points when absent. */
  focus?: PlanePoint;
  /** A fixed box of the plane to show instead of a fit (a cut map shows exactly the box it sampled). */
  box?: PlaneView;
}

/** Equal scale on both axes: `re` and `im` are the plane's ranges at the box's edges. */
export interface LinearPlaneScale {
  kind: 'linear';
  /** The plane point drawn at (0, 0) and the plane length drawn as 1. */
  mid: PlanePoint;
  half: number;
}

/**
 * Directions from `center` are true; distances from it are drawn by `radius` (log scale). Rings
 * mark whole decades.
 */
export interface LogPlaneScale {
  kind: 'log';
  center: PlanePoint;
  centerIs: 'branch point' | 'cut';
  lo: number;
  hi: number;
  rings: { exponent: number; radius: number }[];
}

export interface PlaneFit {
  /** Where a plane point is drawn, in the same units as `box`. */
  project(p: PlanePoint): PlanePoint;
  /** A cut as a drawn polyline: rays run on past the box's edge; in log scale, curved cuts are sampled densely. */
  cutLine(cut: PlaneCut): PlanePoint[];
  /** The box to show, centred on (0, 0). */
  box: PlaneView;
  scale: LinearPlaneScale | LogPlaneScale;
}

/** Distances from the anchor that span more than this ratio are drawn on a log scale. */
export const SPREAD = 1e3;
/** A linear fit shows the nearest branch point (and the nearest point of a cut) when within this many path sizes. */
export const NEAR = 20;
/** A log fit's rim reaches out to the nearest branch point when within this many path sizes. */
export const FAR = 1e3;
const MARGIN = 0.15;
const LOG_BOX = 1.12;
/** A ray drawn this far (in box units) past its last point always leaves the box, zoomed out or not. */
const RAY_REACH = 1e4;
/** Ring steps in decades, the first giving at most six rings wins. */
const RING_STEPS = [1, 2, 5, 10, 20, 25, 50, 100, 200];

const finite = (p: PlanePoint) => Number.isFinite(p.re) && Number.isFinite(p.im);
const distance = (p: PlanePoint, q: PlanePoint) => Math.hypot(p.re - q.re, p.im - q.im);

/**
 * Fits a picture to its own points. When their distances from the nearest branch point (or,
 * when the path lies away from every branch point, from the nearest point of a cut) span more
 * than SPREAD, the picture draws distance from that anchor on a log scale with true directions:
 * a straddle at offsets 1e-3 … 5e-324 from the cut at −0.5, or one point a million away from the
 * rest. Otherwise the box is linear around the points, with the nearest branch point and cut
 * point added when within NEAR path sizes; arithmetic is done in halves and by division, so
 * circles of radius 1e-310 and boxes out to ±1.8e308 neither underflow to a dot nor overflow.
 */
export function fitPlaneView({ points, branchPoints = [], cuts = [], focus, box: fixed }: PlaneFitInput): PlaneFit {
  if (fixed) return linearBox(fixed, 0);
  const pts = points.filter(finite);
  if (pts.length === 0) return linearFit({ re: 0, im: 0 }, 2, { minRe: -1, maxRe: 1, minIm: -1, maxIm: 1 });
  const bounds = boundsOf(pts);
  const mid = { re: bounds.minRe / 2 + bounds.maxRe / 2, im: bounds.minIm / 2 + bounds.maxIm / 2 };
  const size = Math.max(bounds.maxRe / 2 - bounds.minRe / 2, bounds.maxIm / 2 - bounds.minIm / 2) * 2;

  const bps = branchPoints.filter(finite);
  const nearestBranch = bps
    .map((b) => ({ at: b, d: Math.min(...pts.map((p) => distance(p, b))) }))
    .sort((x, y) => x.d - y.d)[0];
  const cutPoint = nearestPointOnCuts(cuts, focus && finite(focus) ? focus : mid);
  const cutDistance = cutPoint ? Math.min(...pts.map((p) => distance(p, cutPoint))) : Infinity;
  // A single point has no size of its own: it is measured against its nearest feature.
  const ownSize = size > 0 ? size : Math.min(nearestBranch?.d ?? Infinity, cutDistance) || 1;
  const pathSize = Number.isFinite(ownSize) ? ownSize : 1;

  const anchor: { at: PlanePoint; is: 'branch point' | 'cut' } | null =
    nearestBranch && (nearestBranch.d <= pathSize || !cutPoint)
      ? { at: nearestBranch.at, is: 'branch point' }
      : cutPoint
        ? { at: cutPoint, is: 'cut' }
        : null;

  if (anchor) {
    const radii = pts.map((p) => distance(p, anchor.at)).filter((r) => r > 0);
    if (radii.length > 1 && Math.max(...radii) / Math.min(...radii) > SPREAD) {
      const toBranch = nearestBranch ? distance(nearestBranch.at, anchor.at) : 0;
      if (nearestBranch && nearestBranch.d <= FAR * pathSize && toBranch > 0) radii.push(toBranch);
      return logFit(anchor.at, anchor.is, radii);
    }
  }

  const shown = [...pts];
  if (nearestBranch && nearestBranch.d <= NEAR * pathSize) shown.push(nearestBranch.at);
  if (cutPoint && cutDistance <= NEAR * pathSize) shown.push(cutPoint);
  return linearBox(boundsOf(shown), MARGIN);
}

/** A linear fit showing `box` with `margin` (in half-widths) around it. */
function linearBox(box: PlaneView, margin: number): PlaneFit {
  const center = { re: box.minRe / 2 + box.maxRe / 2, im: box.minIm / 2 + box.maxIm / 2 };
  const spanHalf = Math.max(box.maxRe / 2 - box.minRe / 2, box.maxIm / 2 - box.minIm / 2);
  // Never thinner than 2^-40 of the box's distance from 0 (doubles hold ~2^-52) nor than the subnormals' grain.
  const half = Math.max(spanHalf, Math.max(Math.abs(center.re), Math.abs(center.im)) * 2 ** -40, 2 ** -1040);
  return linearFit(center, half, {
    minRe: (box.minRe - center.re) / half - margin,
    maxRe: (box.maxRe - center.re) / half + margin,
    minIm: (box.minIm - center.im) / half - margin,
    maxIm: (box.maxIm - center.im) / half + margin,
  });
}

function boundsOf(pts: PlanePoint[]): PlaneView {
  let minRe = Infinity;
  let maxRe = -Infinity;
  let minIm = Infinity;
  let maxIm = -Infinity;
  for (const p of pts) {
    minRe = Math.min(minRe, p.re);
    maxRe = Math.max(maxRe, p.re);
    minIm = Math.min(minIm, p.im);
    maxIm = Math.max(maxIm, p.im);
  }
  return { minRe, maxRe, minIm, maxIm };
}

function linearFit(mid: PlanePoint, half: number, box: PlaneView): PlaneFit {
  const project = (p: PlanePoint) => ({ re: (p.re - mid.re) / half, im: (p.im - mid.im) / half });
  return {
    project,
    cutLine: (cut) => {
      const pts = cut.points.filter(finite);
      const line = pts.map(project);
      if (cut.toInfinity && pts.length >= 2) line.push(rayEnd(line[line.length - 1]!, pts));
      return line;
    },
    box,
    scale: { kind: 'linear', mid, half },
  };
}

/** Where a ray's drawn line ends: RAY_REACH box units on from `from` in the direction of the cut's last segment. */
function rayEnd(from: PlanePoint, pts: PlanePoint[]): PlanePoint {
  const a = pts[pts.length - 2]!;
  const b = pts[pts.length - 1]!;
  const length = Math.hypot(b.re - a.re, b.im - a.im) || 1;
  return { re: from.re + ((b.re - a.re) / length) * RAY_REACH, im: from.im + ((b.im - a.im) / length) * RAY_REACH };
}

function logFit(center: PlanePoint, centerIs: 'branch point' | 'cut', radii: number[]): PlaneFit {
  const lo = Math.floor(Math.log10(Math.min(...radii)));
  const hi = Math.max(lo + 1, Math.ceil(Math.log10(Math.max(...radii))));
  const scale = logDistanceScale(lo, hi);
  const project = (p: PlanePoint) => {
    const dRe = p.re - center.re;
    const dIm = p.im - center.im;
    const r = Math.hypot(dRe, dIm);
    if (r === 0) return { re: 0, im: 0 };
    const f = scale.radius(r);
    // Direction first: 0.08 × 5e-324 underflows to 0, while 5e-324 / 5e-324 is 1.
    return { re: f * (dRe / r), im: f * (dIm / r) };
  };
  const step = RING_STEPS.find((s) => Math.floor(hi / s) - Math.ceil(lo / s) + 1 <= 6) ?? 500;
  const rings: LogPlaneScale['rings'] = [];
  for (let k = Math.ceil(lo / step) * step; k <= hi; k += step)
    rings.push({ exponent: k, radius: scale.radius(10 ** k) });
  return {
    project,
    cutLine: (cut) => {
      const line = sampleCut(cut, center, lo, hi).map(project);
      const pts = cut.points.filter(finite);
      // Far out a ray runs radially, in its own direction: on from the rim to past any zoomed-out edge.
      if (cut.toInfinity && pts.length >= 2 && line.length > 0) line.push(rayEnd(line[line.length - 1]!, pts));
      return line;
    },
    box: { minRe: -LOG_BOX, maxRe: LOG_BOX, minIm: -LOG_BOX, maxIm: LOG_BOX },
    scale: { kind: 'log', center, centerIs, lo, hi, rings },
  };
}

/**
 * Points along a cut dense in log distance from the centre (four a decade each way from the
 * cut's nearest point, out past the rim), so its image under the log scale is drawn as the
 * curve it is; a straight cut through the centre stays a straight line through it.
 */
function sampleCut(cut: PlaneCut, center: PlanePoint, lo: number, hi: number): PlanePoint[] {
  const pts = cut.points.filter(finite);
  const out: PlanePoint[] = [];
  for (let i = 1; i < pts.length; i++) {
    const a = pts[i - 1]!;
    const b = pts[i]!;
    const ray = cut.toInfinity && i === pts.length - 1;
    const length = Math.hypot(b.re - a.re, b.im - a.im);
    if (length === 0) continue;
    const u = { re: (b.re - a.re) / length, im: (b.im - a.im) / length };
    const foot = Math.max(0, (center.re - a.re) * u.re + (center.im - a.im) * u.im);
    const end = ray ? foot + 10 ** (hi + 1) : length;
    const at = new Set<number>([0, Math.min(foot, end), end]);
    for (let k = lo; k <= hi + 1; k += 0.25) {
      const d = 10 ** k;
      for (const s of [foot - d, foot + d]) if (s > 0 && s < end) at.add(s);
    }
    for (const s of [...at].sort((x, y) => x - y)) out.push({ re: a.re + s * u.re, im: a.im + s * u.im });
  }
  return out;
}
