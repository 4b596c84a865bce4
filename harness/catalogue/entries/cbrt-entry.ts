import { CBRT_EXPONENT } from '../../reference/functions/cbrt';
import { POWER_CUTS } from '../../reference/functions/power-cuts';
import { DEMO_SHAPES } from '../demo-shapes';
import type { FunctionEntry } from '../function-entry';

/** cbrt in the function catalogue; its branch policy is stated in harness/reference/functions/cbrt.ts. */
export const cbrtEntry: FunctionEntry = {
  name: 'cbrt',
  reference: {
    kind: 'power',
    cuts: POWER_CUTS,
    exponent: () => ({ kind: 'rational', value: CBRT_EXPONENT }),
  },
  rule: {
    definition:
      'DLMF 4.2.26 with w = 1/3: ∛z = exp(⅓ Log z), |arg| ≤ π/3 (equation number not checked against the DLMF text)',
    annexG:
      'ISO/IEC 9899:2011 G.6.4.1 (cpow, through clog G.6.3.2): on (−∞, 0] the sign of the zero imaginary part picks the side',
    counterClockwise: 'Kahan 1987: the cut (−∞, 0] belongs to the upper side',
  },
  range: null,
  // d/dz z^⅓ = z^(−⅔)/3, so |z·f′| = |z|^⅓/3.
  sensitivity: ([x, y]) => Math.cbrt(Math.hypot(x, y)) / 3,
  sheets: { kind: 'root', degree: 3 },
  fingerprint: [
    { label: 'cbrt', op: 'cbrt', extra: [] },
    // The exponent 1/3 reaches a library as the double nearest it.
    { label: 'pow(z, 1/3)', op: 'pow', extra: [[1 / 3, 0]] },
  ],
  demo: [
    {
      subject: 'cbrt(z)',
      slug: 'cbrt',
      title: 'Cube root',
      cuts: [DEMO_SHAPES.negativeRealAxis],
      branchPoints: [['0', '0']],
      radius: '1',
      laws: [
        { law: 'conjugate-symmetry', region: DEMO_SHAPES.nearCuts },
        { law: 'root-power', power: 3, region: DEMO_SHAPES.disc },
        { law: 'range', region: DEMO_SHAPES.disc },
      ],
      story:
        'Users ask why cbrt(−8) is not −2. The principal cube root of −8 is 1 + √3·i; this suite keeps that choice from drifting to the real root on one side of the cut only.',
    },
  ],
};
