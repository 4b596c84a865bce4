import type { Suite } from '../../../shared/schemas/suite-schema';
import { CUT_CONVENTION_RULE } from '../../checks/function-rules';
import type { Point } from '../../reference/continuation/continuation-path';
import type { CutProximity } from './cut-geometry';

/**
 * The side (+1 left, −1 right of the edge's direction) a point exactly on a cut belongs to, and why:
 * - signed-zero, on a cut lying on an axis: the sign of the zero part picks the side (+0 above
 *   a cut on the real axis, right of one on the imaginary axis), as Annex G does for principal cuts;
 * - counter-clockwise, or a cut not on an axis: the side reached turning counter-clockwise about
 *   the cut's first point, i.e. the right-hand side walking from that point (Kahan's rule for a
 *   ray from its finite end; for a finite cut the first point as written stands for "its finite end").
 */
export function sideOnCut(
  branch: { suite: Pick<Suite, 'convention'> },
  prox: CutProximity,
  p: Point,
): { side: 1 | -1; why: string } {
  const { a, d } = prox.edge;
  const convention = branch.suite.convention;
  if (convention === 'signed-zero' && d[1] === 0 && a[1] === 0) {
    const up = Object.is(p[1], -0) ? -1 : 1;
    return {
      side: (up * Math.sign(d[0])) as 1 | -1,
      why: `the sign of the zero imaginary part picks the side (signed-zero; ${CUT_CONVENTION_RULE['signed-zero']})`,
    };
  }
  if (convention === 'signed-zero' && d[0] === 0 && a[0] === 0) {
    const right = Object.is(p[0], -0) ? -1 : 1;
    return {
      side: (-right * Math.sign(d[1])) as 1 | -1,
      why: `the sign of the zero real part picks the side (signed-zero; ${CUT_CONVENTION_RULE['signed-zero']})`,
    };
  }
  const reason =
    convention === 'signed-zero'
      ? 'no zero part can pick the side of a cut off the axes, so'
      : 'counter-clockwise continuity (Kahan 1987; ISO/IEC 9899:2011 7.3.3):';
  return {
    side: -1,
    why: `${reason} the cut belongs to the side reached turning counter-clockwise about its first point (the right-hand side walking from it)`,
  };
}
