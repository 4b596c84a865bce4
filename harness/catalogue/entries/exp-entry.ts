import { exp } from '../../reference/functions/exp';
import { DEMO_SHAPES } from '../demo-shapes';
import type { FunctionEntry } from '../function-entry';

/** exp in the function catalogue; its branch policy is stated in harness/reference/functions/exp.ts. */
export const expEntry: FunctionEntry = {
  name: 'exp',
  reference: { kind: 'plain', fn: exp },
  rule: {
    definition: 'DLMF §4.2(iii): e^z = e^x (cos y + i sin y), single-valued',
    annexG: 'ISO/IEC 9899:2011 G.6.3.1 (cexp): special values and the sign of a zero imaginary part',
    counterClockwise: 'no cut',
  },
  range: null,
  // d/dz e^z = e^z, so |z·f′| = |z|·e^(Re z).
  sensitivity: ([x, y]) => Math.hypot(x, y) * Math.exp(x),
  sheets: { kind: 'none' },
  fingerprint: [],
  demo: [
    {
      subject: 'exp(z)',
      slug: 'exp',
      title: 'Exponential',
      cuts: [],
      branchPoints: [],
      radius: '1',
      laws: [{ law: 'conjugate-symmetry', region: DEMO_SHAPES.disc }],
      story:
        'exp has no cut; it is here so that every formula built on it is checked on a sound base, including e^{iπ} landing on −1 with a tiny imaginary part of the right sign.',
    },
  ],
};
