import { asin } from '../../reference/functions/asin';
import { DEMO_SHAPES } from '../demo-shapes';
import type { FunctionEntry } from '../function-entry';
import { oneMinusSquareSize } from '../one-minus-square-size';
import { principalRangePart } from '../principal-range-part';

const HALF_PI = Math.PI / 2;

/** asin in the function catalogue; its branch policy is stated in harness/reference/functions/asin.ts. */
export const asinEntry: FunctionEntry = {
  name: 'asin',
  reference: { kind: 'plain', fn: asin },
  rule: {
    definition: 'DLMF 4.23.19: asin z = −i ln(iz + √(1 − z²)), |Re| ≤ π/2',
    annexG:
      'ISO/IEC 9899:2011 G.6 paragraph 7 (casin z = −i casinh(iz)) with G.6.2.2: on (−∞, −1] and [1, ∞) the sign of Im z picks the side',
    counterClockwise: 'Kahan 1987: (−∞, −1] belongs to the upper side, [1, ∞) to the lower',
  },
  range: [principalRangePart('re', -HALF_PI, HALF_PI)],
  // DLMF 4.24.1: d/dz arcsin z = (1 − z²)^(−½) (equation numbers from memory, not checked against the DLMF text).
  sensitivity: (z) => Math.hypot(...z) / Math.sqrt(oneMinusSquareSize(z)),
  sheets: { kind: 'additive', family: 'asin' },
  fingerprint: [{ label: 'asin', op: 'asin', extra: [] }],
  demo: [
    {
      subject: 'asin(z)',
      slug: 'asin',
      title: 'Inverse sine',
      cuts: DEMO_SHAPES.realRaysFromOne,
      branchPoints: DEMO_SHAPES.branchPointsOne,
      radius: '0.5',
      laws: [
        { law: 'odd-symmetry', region: DEMO_SHAPES.disc },
        { law: 'conjugate-symmetry', region: DEMO_SHAPES.nearCuts },
        { law: 'range', region: DEMO_SHAPES.nearCuts },
      ],
      story:
        'asin on (1, ∞) is where hand-written formulas go wrong most often: the two sides differ by the sign of the imaginary part, and the side must follow the sign of a zero imaginary part.',
    },
  ],
};
