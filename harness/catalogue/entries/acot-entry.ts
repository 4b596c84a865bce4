import { acot } from '../../reference/functions/acot';
import { DEMO_SHAPES } from '../demo-shapes';
import type { FunctionEntry } from '../function-entry';
import { onePlusSquareSize } from '../one-plus-square-size';
import { principalRangePart } from '../principal-range-part';

const HALF_PI = Math.PI / 2;

/** acot in the function catalogue; its branch policy is stated in harness/reference/functions/acot.ts. */
export const acotEntry: FunctionEntry = {
  name: 'acot',
  reference: { kind: 'reciprocal', fn: acot },
  rule: {
    definition: 'DLMF 4.23.9: acot z = atan(1/z)',
    annexG:
      'through catan at 1/z (ISO/IEC 9899:2011 G.6): on [−i, 0) and (0, i] the sign of Re z picks the side, as for atan',
    counterClockwise: 'inherited from atan at 1/z (Kahan 1987): (0, i] left, [−i, 0) right',
  },
  range: [principalRangePart('re', -HALF_PI, HALF_PI)],
  // DLMF 4.24.6: d/dz arccot z = −1/(1 + z²) (equation numbers from memory, not checked against the DLMF text).
  sensitivity: (z) => Math.hypot(...z) / onePlusSquareSize(z),
  sheets: { kind: 'additive', family: 'atan' },
  fingerprint: [{ label: 'acot', op: 'acot', extra: [] }],
  demo: [
    {
      subject: 'acot(z)',
      slug: 'acot',
      title: 'Inverse cotangent',
      cuts: [DEMO_SHAPES.imaginaryUnitSegment],
      branchPoints: DEMO_SHAPES.branchPointsI,
      radius: '0.5',
      laws: [{ law: 'odd-symmetry', region: DEMO_SHAPES.disc }],
      story:
        'acot z = atan(1/z) (DLMF 4.23.9) puts the cut on the segment [−i, i]; acot(±0) lies on it, and this suite records which side a library takes there.',
    },
  ],
};
