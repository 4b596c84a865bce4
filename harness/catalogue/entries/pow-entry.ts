import { POWER_CUTS } from '../../reference/functions/power-cuts';
import { DEMO_SHAPES } from '../demo-shapes';
import type { FunctionEntry } from '../function-entry';

/** pow in the function catalogue; its branch policy is stated in harness/reference/functions/pow.ts. */
export const powEntry: FunctionEntry = {
  name: 'pow',
  reference: {
    kind: 'power',
    cuts: POWER_CUTS,
    exponent: ({ w }) => {
      if (!w) throw new RangeError('pow needs an exponent "w"');
      return w;
    },
  },
  rule: {
    definition: 'DLMF 4.2.26: z^w = exp(w Log z) (equation number not checked against the DLMF text)',
    annexG:
      'ISO/IEC 9899:2011 G.6.4.1 (cpow ≈ cexp(w·clog z)): on (−∞, 0] the sign of the zero imaginary part picks the side',
    counterClockwise: 'Kahan 1987: the cut (−∞, 0] belongs to the upper side',
  },
  range: null,
  // it depends on the exponent w: |z·f′| = |w|·|f|, which the law takes from the subject.
  sensitivity: null,
  sheets: { kind: 'exponent' },
  fingerprint: [],
  demo: [
    {
      subject: 'pow(z, 1/3)',
      slug: 'pow-third',
      title: 'Power with the exact exponent 1/3',
      cuts: [DEMO_SHAPES.negativeRealAxis],
      branchPoints: [['0', '0']],
      radius: '1',
      laws: [
        { law: 'root-power', power: 3, region: DEMO_SHAPES.disc },
        { law: 'conjugate-symmetry', region: DEMO_SHAPES.nearCuts },
      ],
      story:
        'pow(z, 1/3) with the exponent given as the exact rational, not the double 0.333…: the reference keeps the two apart, so an error of a third of an ulp in the exponent shows up where |z| is large.',
    },
    {
      subject: 'pow(z, 0.5 + 2i)',
      slug: 'pow-complex',
      title: 'Power with a complex exponent',
      cuts: [DEMO_SHAPES.negativeRealAxis],
      branchPoints: [['0', '0']],
      radius: '1',
      // No property: z^w with a non-real w is not conjugate-symmetric (conj(z^w) = conj(z)^conj(w)),
      // and arg z^w has no simple principal range; the paths carry this suite.
      laws: [],
      story:
        'A complex exponent makes the jump across the cut change the modulus, by e^{±4π}: values on the wrong side are off by a factor of about 286751, not just a sign.',
    },
  ],
};
