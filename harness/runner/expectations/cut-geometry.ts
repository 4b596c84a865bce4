import type { BranchSpec } from '../../../shared/schemas/branch-spec-schema';
import { parseDouble } from '../../reference/numbers/parse-double';

type Point = [number, number];

/** One straight piece of a regular branch's cut layout, walked from `a` along `d` (a ray when `ray`). */
export interface CutEdge {
  a: Point;
  d: Point;
  ray: boolean;
  /** "cut 2" (1-based, as written in the suite), and the piece within it. */
  cut: number;
  piece: number;
}

/** Where a point lies relative to the nearest cut edge. */
export interface CutProximity {
  edge: CutEdge;
  /** The foot of the perpendicular from the point onto the edge. */
  foot: Point;
  /** Distance from the edge. */
  distance: number;
  /** +1 left of the edge's direction, −1 right, 0 exactly on it. */
  side: -1 | 0 | 1;
  /** The unit left normal (−d.im, d.re)/|d|. */
  normal: Point;
}

/**
 * A regular branch's cut layout as straight edges in doubles, for deciding which side of a
 * cut a point is on. Edges parallel to an axis are handled exactly (a point is on a horizontal
 * edge when its imaginary part equals the edge's, ±0 alike); oblique edges by the sign of the
 * cross product in doubles. Only points strictly inside an edge's extent count as near it:
 * past an end the branch is continuous (or the point is a branch point).
 */
export class CutGeometry {
  readonly edges: CutEdge[] = [];

  constructor(branch: Extract<BranchSpec, { kind: 'regular' }>) {
    branch.cuts.forEach((cut, c) => {
      const pts = cut.points.map((p): Point => [parseDouble(p.re), parseDouble(p.im)]);
      for (let i = 0; i + 1 < pts.length; i++) {
        const a = pts[i] as Point;
        const b = pts[i + 1] as Point;
        this.edges.push({ a, d: [b[0] - a[0], b[1] - a[1]], ray: false, cut: c + 1, piece: i + 1 });
      }
      if (cut.to_infinity && pts.length >= 2) {
        const last = pts[pts.length - 1] as Point;
        const prev = pts[pts.length - 2] as Point;
        this.edges.push({
          a: last,
          d: [last[0] - prev[0], last[1] - prev[1]],
          ray: true,
          cut: c + 1,
          piece: pts.length,
        });
      }
    });
  }

  /** The nearest edge whose extent the point projects strictly into, or null when none does. */
  nearest(p: Point): CutProximity | null {
    let best: CutProximity | null = null;
    for (const edge of this.edges) {
      const prox = proximity(edge, p);
      if (prox && (!best || prox.distance < best.distance)) best = prox;
    }
    return best;
  }
}

function proximity(edge: CutEdge, p: Point): CutProximity | null {
  const [dx, dy] = edge.d;
  const length = Math.hypot(dx, dy);
  if (!(length > 0)) return null;
  const normal: Point = [-dy / length, dx / length];
  const rx = p[0] - edge.a[0];
  const ry = p[1] - edge.a[1];
  const u = (rx * dx + ry * dy) / (length * length);
  if (!(u > 0) || (!edge.ray && !(u < 1))) return null;
  if (dy === 0) {
    // Horizontal: exact in the imaginary part; the left of an eastward edge is up.
    const off = p[1] - edge.a[1];
    const side = off === 0 ? 0 : ((Math.sign(off) * Math.sign(dx)) as -1 | 1);
    return { edge, foot: [p[0], edge.a[1]], distance: Math.abs(off), side, normal };
  }
  if (dx === 0) {
    // Vertical: exact in the real part; the left of a northward edge is west.
    const off = p[0] - edge.a[0];
    const side = off === 0 ? 0 : ((-Math.sign(off) * Math.sign(dy)) as -1 | 1);
    return { edge, foot: [edge.a[0], p[1]], distance: Math.abs(off), side, normal };
  }
  const cross = dx * ry - dy * rx;
  const foot: Point = [edge.a[0] + u * dx, edge.a[1] + u * dy];
  return {
    edge,
    foot,
    distance: Math.abs(cross) / length,
    side: cross === 0 ? 0 : (Math.sign(cross) as -1 | 1),
    normal,
  };
}
