import { geometryPoint } from './geometry-point';
import type { PathPoint } from './path-point';
import type { PathSpec } from './path-spec';

/**
 * Exactly the points written, once each and in order, zero signs as written; t is the index over
 * (count − 1) (0 for a single point) so results and pictures can order them, and each point is
 * labelled with its place in the list. Not a continuous path: nothing lies between two points.
 */
export function pointsPath(spec: Extract<PathSpec, { kind: 'points' }>): PathPoint[] {
  const n = spec.points.length;
  if (n < 1) throw new RangeError('a list of points needs at least one point');
  return spec.points.map((p, i) => ({
    t: n === 1 ? 0 : i / (n - 1),
    z: geometryPoint(p, `points[${i}]`),
    label: `point ${i + 1}`,
  }));
}
