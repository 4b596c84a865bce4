import { asinh } from '../../reference/functions/asinh';
import { DEMO_SHAPES } from '../demo-shapes';
import type { FunctionEntry } from '../function-entry';
import { onePlusSquareSize } from '../one-plus-square-size';
import { principalRangePart } from '../principal-range-part';

const HALF_PI = Math.PI / 2;

/** asinh in the function catalogue; its branch policy is stated in harness/reference/functions/asinh.ts. */
export const asinhEntry: FunctionEntry = {
  name: 'asinh',
  reference: { kind: 'plain', fn: asinh },
  rule: {
    definition:
      'DLMF 4.37.16: asinh z = ln(z + √(1 + z²)), |Im| ≤ π/2 (equation number not checked against the DLMF text)',
    annexG: 'ISO/IEC 9899:2011 G.6.2.2 (casinh): on [i, i∞) and (−i∞, −i] the sign of Re z picks the side',
    counterClockwise: 'Kahan 1987: [i, i∞) belongs to the right side, (−i∞, −i] to the left',
  },
  range: [principalRangePart('im', -HALF_PI, HALF_PI)],
  // DLMF 4.38.1: d/dz arcsinh z = (1 + z²)^(−½) (equation numbers from memory, not checked against the DLMF text).
  sensitivity: (z) => Math.hypot(...z) / Math.sqrt(onePlusSquareSize(z)),
  sheets: { kind: 'additive', family: 'asinh' },
  fingerprint: [{ label: 'asinh', op: 'asinh', extra: [] }],
  demo: [
    {
      subject: 'asinh(z)',
      slug: 'asinh',
      title: 'Inverse hyperbolic sine',
      cuts: DEMO_SHAPES.imaginaryRaysFromI,
      branchPoints: DEMO_SHAPES.branchPointsI,
      radius: '0.5',
      laws: [
        { law: 'odd-symmetry', region: DEMO_SHAPES.disc },
        { law: 'conjugate-symmetry', region: DEMO_SHAPES.nearCuts },
      ],
      story:
        'asinh z = −i·asin(iz) moves the cuts to the imaginary axis; a library that implements it through asin must carry the zero signs through the rotation.',
    },
  ],
};
