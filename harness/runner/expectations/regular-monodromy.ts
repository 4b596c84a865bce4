import type { SuitePath } from '../../../shared/schemas/suite-path-schema';
import type { ComplexDouble } from '../../checks/complex-double';
import { buildPath } from '../../paths/build-path';
import type { PathPoint } from '../../paths/path-point';
import { continueRegularBranch } from '../../reference/continuation/continue-regular-branch';
import { Rational } from '../../reference/numbers/rational';
import { continuationPathOf } from './continuation-path-of';
import type { RegularBranch } from './regular-branch';
import { toPathSpec } from '../evaluation/to-path-spec';

/**
 * The factor e^{iν·Δarg g} the branch picks up once around a closed path (a circle of 1 to 64
 * whole turns, or a polyline ending where it starts); null for a path that is not closed.
 */
export function regularMonodromy(
  branch: Pick<RegularBranch, 'continuation' | 'nuDouble'>,
  path: SuitePath,
): { factor: ComplexDouble; nu: [number, number] } | null {
  const spec = continuationPathOf(path);
  if (!spec) return null;
  if (spec.kind === 'circle') {
    const whole = spec.turns.isInteger() && spec.turns.compare(Rational.ZERO) > 0;
    if (!whole || spec.turns.compare(new Rational(64n)) > 0) return null;
  } else {
    const first = spec.points[0] as (typeof spec.points)[number];
    const last = spec.points[spec.points.length - 1] as (typeof spec.points)[number];
    if (path.kind !== 'polyline' || first[0].compare(last[0]) !== 0 || first[1].compare(last[1]) !== 0) return null;
  }
  // The loop's monodromy does not depend on where the branch was fixed, so the continuation
  // starts on the loop itself: a lead-in from z0 could pass through a zero or pole.
  const start = buildPath(toPathSpec(path))[0] as PathPoint;
  const result = continueRegularBranch({
    ...branch.continuation,
    z0: [Rational.fromDouble(start.z.re), Rational.fromDouble(start.z.im)],
    start: { kind: 'sheet', k: 0 },
    cuts: null,
    path: spec,
    at: [Rational.ONE],
  });
  if (result.kind === 'refused') throw new Error(`monodromy along ${path.name}: ${result.reason}`);
  if (!result.monodromy) return null;
  return { factor: [result.monodromy.re.toDouble(), result.monodromy.im.toDouble()], nu: branch.nuDouble };
}
