import { acsc } from '../../reference/functions/acsc';
import { DEMO_SHAPES } from '../demo-shapes';
import type { FunctionEntry } from '../function-entry';
import { oneMinusSquareSize } from '../one-minus-square-size';
import { principalRangePart } from '../principal-range-part';

const HALF_PI = Math.PI / 2;

/** acsc in the function catalogue; its branch policy is stated in harness/reference/functions/acsc.ts. */
export const acscEntry: FunctionEntry = {
  name: 'acsc',
  reference: { kind: 'reciprocal', fn: acsc },
  rule: {
    definition: 'DLMF 4.23.7: acsc z = asin(1/z)',
    annexG:
      'through casin at 1/z (ISO/IEC 9899:2011 G.6): on [−1, 0) and (0, 1] the sign of Im z picks the opposite side of asin’s cut',
    counterClockwise: 'inherited from asin at 1/z (Kahan 1987): [−1, 0) lower, (0, 1] upper',
  },
  range: [principalRangePart('re', -HALF_PI, HALF_PI)],
  // DLMF 4.24.4: d/dz arccsc z = −1/(z(z² − 1)^½), so |z·f′| = |z² − 1|^(−½) (equation numbers from memory, not checked against the DLMF text).
  sensitivity: (z) => 1 / Math.sqrt(oneMinusSquareSize(z)),
  sheets: { kind: 'additive', family: 'asin' },
  fingerprint: [{ label: 'acsc', op: 'acsc', extra: [] }],
  demo: [
    {
      subject: 'acsc(z)',
      slug: 'acsc',
      title: 'Inverse cosecant',
      cuts: [DEMO_SHAPES.realUnitSegment],
      branchPoints: DEMO_SHAPES.branchPointsOne,
      radius: '0.5',
      laws: [{ law: 'odd-symmetry', region: DEMO_SHAPES.disc }],
      story:
        'acsc z = asin(1/z) (DLMF 4.23.7): same cut as asec, odd, and a favourite place for a lost −0 in the reciprocal.',
    },
  ],
};
