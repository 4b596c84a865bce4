import { asech } from '../../reference/functions/asech';
import { DEMO_SHAPES } from '../demo-shapes';
import type { FunctionEntry } from '../function-entry';
import { oneMinusSquareSize } from '../one-minus-square-size';
import { principalRangePart } from '../principal-range-part';

/** asech in the function catalogue; its branch policy is stated in harness/reference/functions/asech.ts. */
export const asechEntry: FunctionEntry = {
  name: 'asech',
  reference: { kind: 'reciprocal', fn: asech },
  rule: {
    definition: 'DLMF 4.37.8: asech z = acosh(1/z)',
    annexG:
      'through cacosh at 1/z (ISO/IEC 9899:2011 G.6.2.1): on (−∞, 0) and [1, ∞) the sign of Im z picks the opposite side of acosh’s cut',
    counterClockwise: 'inherited from acosh at 1/z (Kahan 1987): both pieces lower',
  },
  range: [principalRangePart('re', 0, Infinity), principalRangePart('im', -Math.PI, Math.PI)],
  // DLMF 4.38.5: d/dz arcsech z = ∓1/(z(1 − z²)^½), so |z·f′| = |1 − z²|^(−½) (equation numbers from memory, not checked against the DLMF text).
  sensitivity: (z) => 1 / Math.sqrt(oneMinusSquareSize(z)),
  sheets: { kind: 'additive', family: 'acosh' },
  fingerprint: [{ label: 'asech', op: 'asech', extra: [] }],
  demo: [
    {
      subject: 'asech(z)',
      slug: 'asech',
      title: 'Inverse hyperbolic secant',
      cuts: [DEMO_SHAPES.negativeRealAxis, { kind: 'ray', from: ['1', '0'], through: ['2', '0'] }],
      branchPoints: [
        ['0', '0'],
        ['1', '0'],
        ['-1', '0'],
      ],
      radius: '0.4',
      laws: [{ law: 'conjugate-symmetry', region: DEMO_SHAPES.nearCuts }],
      story:
        'asech z = acosh(1/z) (DLMF 4.37.8) has two cuts, (−∞, 0] and [1, ∞); −1 is a branch point inside the first.',
    },
  ],
};
