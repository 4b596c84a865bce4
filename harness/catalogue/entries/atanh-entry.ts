import { atanh } from '../../reference/functions/atanh';
import { DEMO_SHAPES } from '../demo-shapes';
import type { FunctionEntry } from '../function-entry';
import { oneMinusSquareSize } from '../one-minus-square-size';
import { principalRangePart } from '../principal-range-part';

const HALF_PI = Math.PI / 2;

/** atanh in the function catalogue; its branch policy is stated in harness/reference/functions/atanh.ts. */
export const atanhEntry: FunctionEntry = {
  name: 'atanh',
  reference: { kind: 'plain', fn: atanh },
  rule: {
    definition:
      'DLMF 4.37.24: atanh z = ½ ln((1 + z)/(1 − z)), |Im| ≤ π/2 (equation number not checked against the DLMF text)',
    annexG: 'ISO/IEC 9899:2011 G.6.2.3 (catanh): on (−∞, −1] and [1, ∞) the sign of Im z picks the side',
    counterClockwise: 'Kahan 1987: (−∞, −1] belongs to the upper side, [1, ∞) to the lower',
  },
  range: [principalRangePart('im', -HALF_PI, HALF_PI)],
  // DLMF 4.38.3: d/dz arctanh z = 1/(1 − z²) (equation numbers from memory, not checked against the DLMF text).
  sensitivity: (z) => Math.hypot(...z) / oneMinusSquareSize(z),
  sheets: { kind: 'additive', family: 'atanh' },
  fingerprint: [{ label: 'atanh', op: 'atanh', extra: [] }],
  demo: [
    {
      subject: 'atanh(z)',
      slug: 'atanh',
      title: 'Inverse hyperbolic tangent',
      cuts: DEMO_SHAPES.realRaysFromOne,
      branchPoints: DEMO_SHAPES.branchPointsOne,
      radius: '0.5',
      laws: [
        { law: 'odd-symmetry', region: DEMO_SHAPES.disc },
        { law: 'conjugate-symmetry', region: DEMO_SHAPES.nearCuts },
      ],
      story:
        'atanh has logarithmic branch points at ±1, so circles around them add ±iπ/2 per turn rather than flipping a sign.',
    },
  ],
};
