import { acos } from '../../reference/functions/acos';
import { DEMO_SHAPES } from '../demo-shapes';
import type { FunctionEntry } from '../function-entry';
import { oneMinusSquareSize } from '../one-minus-square-size';
import { principalRangePart } from '../principal-range-part';

/** acos in the function catalogue; its branch policy is stated in harness/reference/functions/acos.ts. */
export const acosEntry: FunctionEntry = {
  name: 'acos',
  reference: { kind: 'plain', fn: acos },
  rule: {
    definition: 'DLMF 4.23.22: acos z = π/2 + i ln((1 − z²)^½ + iz) = π/2 − asin z, 0 ≤ Re ≤ π',
    annexG: 'ISO/IEC 9899:2011 G.6.1.1 (cacos): on (−∞, −1] and [1, ∞) the sign of Im z picks the side',
    counterClockwise: 'Kahan 1987: (−∞, −1] belongs to the upper side, [1, ∞) to the lower',
  },
  range: [principalRangePart('re', 0, Math.PI)],
  // DLMF 4.24.2: d/dz arccos z = −(1 − z²)^(−½) (equation numbers from memory, not checked against the DLMF text).
  sensitivity: (z) => Math.hypot(...z) / Math.sqrt(oneMinusSquareSize(z)),
  sheets: { kind: 'additive', family: 'acos' },
  fingerprint: [{ label: 'acos', op: 'acos', extra: [] }],
  demo: [
    {
      subject: 'acos(z)',
      slug: 'acos',
      title: 'Inverse cosine',
      cuts: DEMO_SHAPES.realRaysFromOne,
      branchPoints: DEMO_SHAPES.branchPointsOne,
      radius: '0.5',
      laws: [
        { law: 'conjugate-symmetry', region: DEMO_SHAPES.nearCuts },
        { law: 'range', region: DEMO_SHAPES.nearCuts },
      ],
      story: 'acos = π/2 − asin only if both land on the same sides of their cuts; this suite checks acos on its own.',
    },
  ],
};
