import { acoth } from '../../reference/functions/acoth';
import { DEMO_SHAPES } from '../demo-shapes';
import type { FunctionEntry } from '../function-entry';
import { oneMinusSquareSize } from '../one-minus-square-size';
import { principalRangePart } from '../principal-range-part';

const HALF_PI = Math.PI / 2;

/** acoth in the function catalogue; its branch policy is stated in harness/reference/functions/acoth.ts. */
export const acothEntry: FunctionEntry = {
  name: 'acoth',
  reference: { kind: 'reciprocal', fn: acoth },
  rule: {
    definition: 'DLMF 4.37.9: acoth z = atanh(1/z)',
    annexG:
      'through catanh at 1/z (ISO/IEC 9899:2011 G.6.2.3): on [−1, 0) and (0, 1] the sign of Im z picks the opposite side of atanh’s cut',
    counterClockwise: 'inherited from atanh at 1/z (Kahan 1987): [−1, 0) lower, (0, 1] upper',
  },
  range: [principalRangePart('im', -HALF_PI, HALF_PI)],
  // DLMF 4.38.6: d/dz arccoth z = 1/(1 − z²) (equation numbers from memory, not checked against the DLMF text).
  sensitivity: (z) => Math.hypot(...z) / oneMinusSquareSize(z),
  sheets: { kind: 'additive', family: 'atanh' },
  fingerprint: [{ label: 'acoth', op: 'acoth', extra: [] }],
  demo: [
    {
      subject: 'acoth(z)',
      slug: 'acoth',
      title: 'Inverse hyperbolic cotangent',
      cuts: [DEMO_SHAPES.realUnitSegment],
      branchPoints: DEMO_SHAPES.branchPointsOne,
      radius: '0.5',
      laws: [{ law: 'odd-symmetry', region: DEMO_SHAPES.disc }],
      story: 'acoth z = atanh(1/z) (DLMF 4.37.9): its cut is [−1, 1], the complement of atanh’s.',
    },
  ],
};
