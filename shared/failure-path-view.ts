import type { DiagnosisKind } from './diagnosis';
import type { OutcomeCounts } from './run-result';

/** A point of the plane as two finite doubles (JSON has no −0, inf or nan: those points are not drawn). */
export interface PlaneXY {
  re: number;
  im: number;
}

/**
 * One point of a failing case's path, for the pictures of the case screen. `actualArg` of a
 * passing point is its expected value's argument: a pass lies within the suite's tolerance of
 * the expected value, and the run stores no passing value one by one (`actualFrom` says which).
 */
export interface FailurePathPoint {
  index: number;
  t: number;
  /** null when a part is not finite. */
  z: PlaneXY | null;
  outcome: 'pass' | 'fail' | 'error' | 'skipped';
  diagnosis: DiagnosisKind | null;
  /** Error in ulps of a failing point; null for a pass (within tolerance, not stored) and where not finite. */
  ulps: number | null;
  /** Arguments of the expected and the library's value, in (−π, π]; null where there is none. */
  expectedArg: number | null;
  actualArg: number | null;
  actualFrom: 'stored' | 'expected-within-tolerance' | 'none';
  /** The failure row of this point in the same run, when it failed. */
  failureId: string | null;
}

/** GET /api/failures/:id/path: the case's path with every point's outcome, the expected cuts and branch points. */
export interface FailurePathView {
  failureId: string;
  /** Index of this case's point in `points`. */
  focusIndex: number;
  suite: { slug: string; version: number; subject: string; branch: 'principal' | 'regular'; convention: string };
  target: string;
  path: { name: string; kind: string; points: number };
  /** How the x axis of the plots along the path is read: t for circle, segment and polyline; point number for straddle, grid and a list of points. */
  axis: 't' | 'index';
  tolerance: { ulps: number | null; relative: number | null };
  points: FailurePathPoint[];
  /** Expected cuts as polylines; the last segment continues to infinity when `toInfinity`. */
  cuts: { points: PlaneXY[]; toInfinity: boolean }[];
  /** Why no cuts are drawn, when none are (a composite principal subject). */
  cutsNote: string | null;
  branchPoints: PlaneXY[];
  /** From the run's path summary: where the reference and the library jumped along a continuous path (values of t). */
  jumps: { expected: number[]; library: number[] } | null;
  counts: OutcomeCounts;
  /** What the pictures show and do not show, in words. */
  note: string;
  /** How the expected values along the path were had: read from the reference values kept on disk by the runs, or computed for this answer. */
  reference: { cached: number; computed: number };
}
