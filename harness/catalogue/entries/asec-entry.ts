import { asec } from '../../reference/functions/asec';
import { DEMO_SHAPES } from '../demo-shapes';
import type { FunctionEntry } from '../function-entry';
import { oneMinusSquareSize } from '../one-minus-square-size';
import { principalRangePart } from '../principal-range-part';

/** asec in the function catalogue; its branch policy is stated in harness/reference/functions/asec.ts. */
export const asecEntry: FunctionEntry = {
  name: 'asec',
  reference: { kind: 'reciprocal', fn: asec },
  rule: {
    definition: 'DLMF 4.23.8: asec z = acos(1/z)',
    annexG:
      'through cacos at 1/z (ISO/IEC 9899:2011 G.6.1.1): on [−1, 0) and (0, 1] the sign of Im z picks the opposite side of acos’s cut',
    counterClockwise: 'inherited from acos at 1/z (Kahan 1987): [−1, 0) lower, (0, 1] upper',
  },
  range: [principalRangePart('re', 0, Math.PI)],
  // DLMF 4.24.5: d/dz arcsec z = 1/(z(z² − 1)^½), so |z·f′| = |z² − 1|^(−½) (equation numbers from memory, not checked against the DLMF text).
  sensitivity: (z) => 1 / Math.sqrt(oneMinusSquareSize(z)),
  sheets: { kind: 'additive', family: 'acos' },
  fingerprint: [{ label: 'asec', op: 'asec', extra: [] }],
  demo: [
    {
      subject: 'asec(z)',
      slug: 'asec',
      title: 'Inverse secant',
      cuts: [DEMO_SHAPES.realUnitSegment],
      branchPoints: DEMO_SHAPES.branchPointsOne,
      radius: '0.5',
      laws: [{ law: 'conjugate-symmetry', region: DEMO_SHAPES.nearCuts }],
      story:
        'asec z = acos(1/z) (DLMF 4.23.8): the cut is [−1, 1], and 1/z turns the sign of a zero imaginary part, so the sides swap relative to acos.',
    },
  ],
};
