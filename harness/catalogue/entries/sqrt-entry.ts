import { sqrt } from '../../reference/functions/sqrt';
import { DEMO_SHAPES } from '../demo-shapes';
import type { FunctionEntry } from '../function-entry';
import { principalRangePart } from '../principal-range-part';

const HALF_PI = Math.PI / 2;

/** sqrt in the function catalogue; its branch policy is stated in harness/reference/functions/sqrt.ts. */
export const sqrtEntry: FunctionEntry = {
  name: 'sqrt',
  reference: { kind: 'plain', fn: sqrt },
  rule: {
    definition: 'DLMF §4.2(iv) with 4.2.7: √z = exp(½ Log z), Re √z ≥ 0',
    annexG:
      'ISO/IEC 9899:2011 G.6.4.2 (csqrt): on (−∞, 0] the sign of the zero imaginary part picks the side, csqrt(conj z) = conj csqrt(z)',
    counterClockwise: 'Kahan 1987: the cut (−∞, 0] belongs to the upper side, √(−4) = 2i',
  },
  range: [principalRangePart('arg', -HALF_PI, HALF_PI, true)],
  // d/dz √z = 1/(2√z), so |z·f′| = √|z|/2.
  sensitivity: ([x, y]) => Math.sqrt(Math.hypot(x, y)) / 2,
  sheets: { kind: 'root', degree: 2 },
  fingerprint: [
    { label: 'sqrt', op: 'sqrt', extra: [] },
    // The root written as a power: a library that gets √ right may still get pow(z, 1/2) wrong on the same cut.
    { label: 'pow(z, 1/2)', op: 'pow', extra: [[0.5, 0]] },
  ],
  demo: [
    {
      subject: 'sqrt(z)',
      slug: 'sqrt',
      title: 'Square root',
      cuts: [DEMO_SHAPES.negativeRealAxis],
      branchPoints: [['0', '0']],
      radius: '1',
      laws: [
        { law: 'conjugate-symmetry', region: DEMO_SHAPES.nearCuts },
        { law: 'root-power', power: 2, region: DEMO_SHAPES.disc },
        { law: 'range', region: DEMO_SHAPES.nearCuts },
      ],
      story:
        'The release notes of our complex type promise csqrt semantics. This suite pins the values on both sides of the negative real axis, where a lost −0 turns 2i into −2i.',
    },
  ],
};
