import { atan } from '../../reference/functions/atan';
import { DEMO_SHAPES } from '../demo-shapes';
import type { FunctionEntry } from '../function-entry';
import { onePlusSquareSize } from '../one-plus-square-size';
import { principalRangePart } from '../principal-range-part';

const HALF_PI = Math.PI / 2;

/** atan in the function catalogue; its branch policy is stated in harness/reference/functions/atan.ts. */
export const atanEntry: FunctionEntry = {
  name: 'atan',
  reference: { kind: 'plain', fn: atan },
  rule: {
    definition: 'DLMF 4.23.26: atan z = (i/2) ln((i + z)/(i − z)), |Re| ≤ π/2',
    annexG:
      'ISO/IEC 9899:2011 G.6 paragraph 7 (catan z = −i catanh(iz)) with G.6.2.3: on [i, i∞) and (−i∞, −i] the sign of Re z picks the side',
    counterClockwise: 'Kahan 1987: [i, i∞) belongs to the right side, (−i∞, −i] to the left',
  },
  range: [principalRangePart('re', -HALF_PI, HALF_PI)],
  // DLMF 4.24.3: d/dz arctan z = 1/(1 + z²) (equation numbers from memory, not checked against the DLMF text).
  sensitivity: (z) => Math.hypot(...z) / onePlusSquareSize(z),
  sheets: { kind: 'additive', family: 'atan' },
  fingerprint: [{ label: 'atan', op: 'atan', extra: [] }],
  demo: [
    {
      subject: 'atan(z)',
      slug: 'atan',
      title: 'Inverse tangent',
      cuts: DEMO_SHAPES.imaginaryRaysFromI,
      branchPoints: DEMO_SHAPES.branchPointsI,
      radius: '0.5',
      laws: [
        { law: 'odd-symmetry', region: DEMO_SHAPES.disc },
        { law: 'conjugate-symmetry', region: DEMO_SHAPES.nearCuts },
        { law: 'range', region: DEMO_SHAPES.nearCuts },
      ],
      story:
        'The cuts of atan run up and down the imaginary axis from ±i; a zero real part decides the side, which formulas through log((1+iz)/(1−iz)) often lose.',
    },
  ],
};
