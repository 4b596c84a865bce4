import { nthrootExponent } from '../../reference/functions/nthroot';
import { POWER_CUTS } from '../../reference/functions/power-cuts';
import { DEMO_SHAPES } from '../demo-shapes';
import type { FunctionEntry } from '../function-entry';

/** nthroot in the function catalogue; its branch policy is stated in harness/reference/functions/nthroot.ts. */
export const nthrootEntry: FunctionEntry = {
  name: 'nthroot',
  reference: {
    kind: 'power',
    cuts: POWER_CUTS,
    exponent: ({ n }) => ({ kind: 'rational', value: nthrootExponent(n) }),
  },
  rule: {
    definition:
      'DLMF 4.2.26 with w = 1/n: z^(1/n) = exp(Log z / n) (equation number not checked against the DLMF text)',
    annexG:
      'ISO/IEC 9899:2011 G.6.4.1 (cpow, through clog G.6.3.2): on (−∞, 0] the sign of the zero imaginary part picks the side',
    counterClockwise: 'Kahan 1987: the cut (−∞, 0] belongs to the upper side',
  },
  range: null,
  // it depends on the degree n: |z·f′| = |f|/n, which the law takes from the subject.
  sensitivity: null,
  sheets: { kind: 'exponent' },
  fingerprint: [{ label: 'nthroot(z, 3)', op: 'nthroot', extra: [[3, 0]] }],
  demo: [
    {
      subject: 'nthroot(z, 5)',
      slug: 'nthroot-5',
      title: 'Fifth root',
      cuts: [DEMO_SHAPES.negativeRealAxis],
      branchPoints: [['0', '0']],
      radius: '1',
      laws: [
        { law: 'root-power', power: 5, region: DEMO_SHAPES.disc },
        { law: 'range', region: DEMO_SHAPES.disc },
      ],
      story:
        'The fifth root is built from pow in one library and from polar form in another; both must land on the principal sheet, arg in (−π/5, π/5].',
    },
  ],
};
