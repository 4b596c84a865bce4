import { acosh } from '../../reference/functions/acosh';
import { DEMO_SHAPES } from '../demo-shapes';
import type { FunctionEntry } from '../function-entry';
import { oneMinusSquareSize } from '../one-minus-square-size';
import { principalRangePart } from '../principal-range-part';

/** acosh in the function catalogue; its branch policy is stated in harness/reference/functions/acosh.ts. */
export const acoshEntry: FunctionEntry = {
  name: 'acosh',
  reference: { kind: 'plain', fn: acosh },
  rule: {
    definition:
      'DLMF 4.37.17: acosh z = ln(z + (z + 1)√((z − 1)/(z + 1))), Re ≥ 0 (equation number not checked against the DLMF text)',
    annexG: 'ISO/IEC 9899:2011 G.6.2.1 (cacosh): on (−∞, 1] the sign of Im z picks the side',
    counterClockwise: 'Kahan 1987: the cut (−∞, 1] belongs to the upper side',
  },
  range: [principalRangePart('re', 0, Infinity), principalRangePart('im', -Math.PI, Math.PI, true)],
  // DLMF 4.38.2: d/dz arccosh z = (z² − 1)^(−½) (equation numbers from memory, not checked against the DLMF text).
  sensitivity: (z) => Math.hypot(...z) / Math.sqrt(oneMinusSquareSize(z)),
  sheets: { kind: 'additive', family: 'acosh' },
  fingerprint: [{ label: 'acosh', op: 'acosh', extra: [] }],
  demo: [
    {
      subject: 'acosh(z)',
      slug: 'acosh',
      title: 'Inverse hyperbolic cosine',
      cuts: [{ kind: 'ray', from: ['1', '0'], through: ['0', '0'] }],
      branchPoints: DEMO_SHAPES.branchPointsOne,
      radius: '0.5',
      laws: [
        { law: 'conjugate-symmetry', region: DEMO_SHAPES.nearCuts },
        { law: 'range', region: DEMO_SHAPES.nearCuts },
      ],
      story:
        'One cut, (−∞, 1], but two branch points on it: the values jump differently on (−1, 1) and on (−∞, −1), which catches formulas built from the wrong square roots.',
    },
  ],
};
