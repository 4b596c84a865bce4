import { otherSheets } from '../../checks/other-sheets';
import type { ComplexDouble } from '../../checks/complex-double';
import type { PathPoint } from '../../paths/path-point';
import type { Point } from '../../reference/continuation/continuation-path';
import type { PointAlternatives } from './expectation';
import type { RegularBranch } from './regular-branch';
import { regularValueAt } from './regular-value-at';
import { REGULAR_TUNING } from './regular-tuning';
import { sideOnCut } from './side-on-cut';

/**
 * What a failing point's value may be instead, for the diagnosis: the value at the point with
 * its zero part's sign flipped (signed-zero suites), the value from the other side of a cut
 * within 2e-3, both one-sided limits when the point lies on a cut, and the other sheets; with
 * the rule that fixes the expected value, in words (docs/regular-branches.md says more).
 */
export function regularAlternatives(
  branch: RegularBranch,
  points: readonly PathPoint[],
  index: number,
  expected: ComplexDouble,
): PointAlternatives {
  const pp = points[index] as PathPoint;
  const p: Point = [pp.z.re, pp.z.im];
  const alt: PointAlternatives = {
    // Plain words only: this rule is shown on the case page and in every output, where a path into this repository means nothing.
    rule: `${branch.description}, continued from z0 to z along a path that crosses none of the suite's cuts`,
  };
  const tryValue = (x: Point, kind: number): Point | null => {
    try {
      return regularValueAt(branch, x, kind, null);
    } catch {
      return null;
    }
  };
  if (branch.suite.convention === 'signed-zero' && (p[0] === 0 || p[1] === 0)) {
    const part = p[1] === 0 ? 'im' : 're';
    const flipped = tryValue(part === 'im' ? [p[0], -p[1]] : [-p[0], p[1]], REGULAR_TUNING.kindValue);
    if (flipped) alt.flippedZero = { part, value: flipped };
  }
  const prox = branch.geometry.nearest(p);
  const scale = Math.max(1, Math.hypot(p[0], p[1]));
  if (prox && prox.distance <= REGULAR_TUNING.sideReach * scale) {
    const other = tryValue(p, REGULAR_TUNING.kindOtherSide);
    if (other) alt.otherSide = other;
    if (prox.side === 0 && other) {
      const { side, why } = sideOnCut(branch, prox, p);
      const [dx, dy] = prox.edge.d;
      const [left, right] =
        dy === 0
          ? dx > 0
            ? ['above', 'below']
            : ['below', 'above']
          : dx === 0
            ? dy > 0
              ? ['the left', 'the right']
              : ['the right', 'the left']
            : ['the left (walking from its first point)', 'the right'];
      const values: [ComplexDouble, ComplexDouble] = side === 1 ? [expected, other] : [other, expected];
      alt.limits = {
        sides: [`from ${left} of cut ${prox.edge.cut}`, `from ${right} of cut ${prox.edge.cut}`],
        values,
      };
      alt.rule += `; z lies on cut ${prox.edge.cut}: ${why}`;
    } else if (prox.side !== 0) {
      alt.rule += `; z lies ${prox.distance} from cut ${prox.edge.cut}, on its ${prox.side === 1 ? 'left' : 'right'}-hand side walking from its first point`;
    }
  }
  alt.otherSheets = otherSheets({ kind: 'power', nu: branch.nuDouble, ks: branch.sheetKs, sign: 1 }, expected);
  return alt;
}
