import type { Point } from '../../reference/continuation/continuation-path';
import type { CutProximity } from './cut-geometry';
import type { RegularBranch } from './regular-branch';
import { REGULAR_TUNING } from './regular-tuning';
import { sideOnCut } from './side-on-cut';

/**
 * Which point the continuation aims at for p, on the side wanted (`flip`: the other side of the
 * nearest cut). Near a cut (within 1e-6·max(1, |z|)) it is a probe point 1e-6 off the cut on the
 * chosen side, so a point 5e-324 from the cut is not at the mercy of rounding in the crossing test.
 */
export function probePoint(
  branch: Pick<RegularBranch, 'geometry' | 'suite'>,
  p: Point,
  flip: boolean,
): { q: Point; prox: CutProximity | null } {
  const prox = branch.geometry.nearest(p);
  const scale = Math.max(1, Math.hypot(p[0], p[1]));
  if (!prox || prox.distance > (flip ? REGULAR_TUNING.sideReach : REGULAR_TUNING.probe) * scale)
    return { q: p, prox: null };
  const side = (prox.side !== 0 ? prox.side : sideOnCut(branch, prox, p).side) * (flip ? -1 : 1);
  const h = Math.max(prox.distance, REGULAR_TUNING.probe * scale);
  return { q: [prox.foot[0] + side * h * prox.normal[0], prox.foot[1] + side * h * prox.normal[1]], prox };
}
