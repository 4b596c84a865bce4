import { circlePath } from './circle-path';
import { gridPath } from './grid-path';
import type { PathPoint } from './path-point';
import type { PathSpec } from './path-spec';
import { pointsPath } from './points-path';
import { polylinePath } from './polyline-path';
import { segmentPath } from './segment-path';
import { straddlePath } from './straddle-path';

/** The points of any path, by kind. */
export function buildPath(spec: PathSpec): PathPoint[] {
  switch (spec.kind) {
    case 'circle':
      return circlePath(spec);
    case 'segment':
      return segmentPath(spec);
    case 'polyline':
      return polylinePath(spec);
    case 'straddle':
      return straddlePath(spec);
    case 'points':
      return pointsPath(spec);
    case 'grid':
      return gridPath(spec);
    default:
      throw new RangeError(`unknown path kind ${JSON.stringify((spec as { kind?: unknown }).kind)}`);
  }
}
