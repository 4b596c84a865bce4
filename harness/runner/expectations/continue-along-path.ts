import type { SuitePath } from '../../../shared/schemas/suite-path-schema';
import type { PathPoint } from '../../paths/path-point';
import type { PathSpec } from '../../paths/path-spec';
import { polylineLayout } from '../../paths/polyline-layout';
import { sampleParameters } from '../../paths/sample-parameters';
import type { Point } from '../../reference/continuation/continuation-path';
import { continueRegularBranch } from '../../reference/continuation/continue-regular-branch';
import { parseExact } from '../../reference/continuation/parse-exact';
import { Rational } from '../../reference/numbers/rational';
import { toPathSpec } from '../evaluation/to-path-spec';
import { continuationPathOf } from './continuation-path-of';
import type { RegularBranch } from './regular-branch';
import { REGULAR_TUNING } from './regular-tuning';

/**
 * Continued values at the points of a whole circle, segment or polyline, by one continuation
 * along it; null when it cannot be done that way (another kind of path, too many points, or the
 * engine refuses), and the points are then continued one by one.
 */
export function continueAlongPath(
  branch: Pick<RegularBranch, 'pathValues' | 'continuation'>,
  path: SuitePath,
  points: readonly PathPoint[],
): (Point | null)[] | null {
  if (branch.pathValues.has(points)) return branch.pathValues.get(points) ?? null;
  let values: (Point | null)[] | null = null;
  try {
    const spec = continuationPathOf(path);
    const at = continuousAt(path);
    if (spec && at && at.length === points.length && at.length <= REGULAR_TUNING.maxAt) {
      const result = continueRegularBranch({ ...branch.continuation, path: spec, at });
      if (result.kind === 'continued' && result.values.length === points.length)
        values = result.values.map((v) => [v.f.re.toDouble(), v.f.im.toDouble()]);
    }
  } catch {
    values = null;
  }
  branch.pathValues.set(points, values);
  return values;
}

/**
 * The values of t of a continuous path, exactly as written or as the i/(n − 1) of its samples,
 * with a polyline's vertices among them as the path builder puts them (polyline-layout.ts): a
 * vertex's t is the double fraction of arc length, taken exactly, whose point lies within an ulp
 * of the vertex, enough to pick the sheet there. Null for other kinds.
 */
function continuousAt(path: SuitePath): Rational[] | null {
  if (path.kind !== 'circle' && path.kind !== 'segment' && path.kind !== 'polyline') return null;
  const texts =
    path.at ??
    (path.samples === 1
      ? ['0']
      : sampleParameters({ samples: path.samples as number }).map((_, i) => `${i}/${(path.samples as number) - 1}`));
  const written = texts.map((t, i) => parseExact(t, `${path.name}: at.${i}`));
  if (path.kind !== 'polyline') return written;
  const spec = toPathSpec(path) as Extract<PathSpec, { kind: 'polyline' }>;
  return polylineLayout(spec).parameters.map((p) =>
    p.sample !== null ? (written[p.sample] as Rational) : Rational.fromDouble(p.t),
  );
}
