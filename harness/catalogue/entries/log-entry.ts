import { log } from '../../reference/functions/log';
import { DEMO_SHAPES } from '../demo-shapes';
import type { FunctionEntry } from '../function-entry';
import { principalRangePart } from '../principal-range-part';

/** log in the function catalogue; its branch policy is stated in harness/reference/functions/log.ts. */
export const logEntry: FunctionEntry = {
  name: 'log',
  reference: { kind: 'plain', fn: log },
  rule: {
    definition: 'DLMF 4.2.5, with 4.2.7 on the cut: Log z = ln|z| + i Arg z, −π < Arg ≤ π',
    annexG: 'ISO/IEC 9899:2011 G.6.3.2 (clog): Log(x ± 0i) = ln|x| ± iπ for x < 0, clog(conj z) = conj clog(z)',
    counterClockwise: 'Kahan 1987: the cut (−∞, 0] belongs to the upper side, Log(−1) = iπ',
  },
  range: [principalRangePart('im', -Math.PI, Math.PI, true)],
  // d/dz ln z = 1/z (DLMF 4.10, equation number from memory), so |z·f′| = 1.
  sensitivity: () => 1,
  sheets: { kind: 'additive', family: 'log' },
  fingerprint: [{ label: 'log', op: 'log', extra: [] }],
  demo: [
    {
      subject: 'log(z)',
      slug: 'log',
      title: 'Logarithm',
      cuts: [DEMO_SHAPES.negativeRealAxis],
      branchPoints: [['0', '0']],
      radius: '1',
      laws: [
        { law: 'exp-log', region: DEMO_SHAPES.disc },
        { law: 'conjugate-symmetry', region: DEMO_SHAPES.nearCuts },
        { law: 'range', region: DEMO_SHAPES.nearCuts },
        { law: 'unwinding', region: DEMO_SHAPES.disc },
      ],
      story:
        'Im log z must lie in (−π, π], with −π reached only from below the cut under signed zeros. Every power and inverse function inherits this choice.',
    },
  ],
};
