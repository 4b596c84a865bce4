import type { ExactPoint, Point } from '../../reference/continuation/continuation-path';
import { continueRegularBranch } from '../../reference/continuation/continue-regular-branch';
import { Rational } from '../../reference/numbers/rational';
import type { RegularBranch } from './regular-branch';
import { pointText } from '../formats/point-text';

/** A double as an exact point coordinate (every double is a dyadic rational). */
const exactPoint = ([re, im]: Point): ExactPoint => [Rational.fromDouble(re), Rational.fromDouble(im)];

/**
 * The branch's value at q by the continuation engine, along z0 → q: the straight line first,
 * then lines bent through a point off its middle (±0.3, ±0.7, 1.3 of its length) when the
 * straight one passes through a zero or pole of g.
 */
export function continueToPoint(branch: Pick<RegularBranch, 'continued' | 'continuation' | 'z0'>, q: Point): Point {
  const key = `${q[0]},${q[1]}`;
  const known = branch.continued.get(key);
  if (known) return known;
  const z0 = branch.z0;
  const span = Math.hypot(q[0] - z0[0], q[1] - z0[1]);
  const mid: Point = [(q[0] + z0[0]) / 2, (q[1] + z0[1]) / 2];
  const normal: Point = span > 0 ? [-(q[1] - z0[1]) / span, (q[0] - z0[0]) / span] : [0, 1];
  const routes: Point[][] = [[]];
  for (const s of [0.3, -0.3, 0.7, -0.7, 1.3])
    routes.push([[mid[0] + s * span * normal[0], mid[1] + s * span * normal[1]]]);
  let lastError = '';
  for (const via of routes) {
    const result = continueRegularBranch({
      ...branch.continuation,
      path: { kind: 'polyline', points: [branch.continuation.z0, ...via.map(exactPoint), exactPoint(q)] },
      at: [Rational.ONE],
    });
    if (result.kind === 'continued') {
      const f = (result.values[0] as (typeof result.values)[number]).f;
      const v: Point = [f.re.toDouble(), f.im.toDouble()];
      branch.continued.set(key, v);
      return v;
    }
    lastError = result.reason;
  }
  throw new Error(`the branch could not be continued to ${pointText(q)}: ${lastError}`);
}
