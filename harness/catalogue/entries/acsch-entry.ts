import { acsch } from '../../reference/functions/acsch';
import { DEMO_SHAPES } from '../demo-shapes';
import type { FunctionEntry } from '../function-entry';
import { onePlusSquareSize } from '../one-plus-square-size';
import { principalRangePart } from '../principal-range-part';

const HALF_PI = Math.PI / 2;

/** acsch in the function catalogue; its branch policy is stated in harness/reference/functions/acsch.ts. */
export const acschEntry: FunctionEntry = {
  name: 'acsch',
  reference: { kind: 'reciprocal', fn: acsch },
  rule: {
    definition: 'DLMF 4.37.7: acsch z = asinh(1/z)',
    annexG:
      'through casinh at 1/z (ISO/IEC 9899:2011 G.6.2.2): on [−i, 0) and (0, i] the sign of Re z picks the side, as for asinh',
    counterClockwise: 'inherited from asinh at 1/z (Kahan 1987): [−i, 0) right, (0, i] left',
  },
  range: [principalRangePart('im', -HALF_PI, HALF_PI)],
  // DLMF 4.38.4: d/dz arccsch z = ∓1/(z(1 + z²)^½), so |z·f′| = |1 + z²|^(−½) (equation numbers from memory, not checked against the DLMF text).
  sensitivity: (z) => 1 / Math.sqrt(onePlusSquareSize(z)),
  sheets: { kind: 'additive', family: 'asinh' },
  fingerprint: [{ label: 'acsch', op: 'acsch', extra: [] }],
  demo: [
    {
      subject: 'acsch(z)',
      slug: 'acsch',
      title: 'Inverse hyperbolic cosecant',
      cuts: [DEMO_SHAPES.imaginaryUnitSegment],
      branchPoints: DEMO_SHAPES.branchPointsI,
      radius: '0.5',
      laws: [{ law: 'odd-symmetry', region: DEMO_SHAPES.disc }],
      story:
        'acsch z = asinh(1/z) (DLMF 4.37.7): cut [−i, i]; the reciprocal maps the outside of asinh’s cuts onto it.',
    },
  ],
};
