import type { SuiteInput } from '../../shared/schemas/suite-schema';

const z = (re: string, im: string) => ({ re, im });

/**
 * Agreement checks: two ways a library offers to compute one function, which must give the same
 * value at every point (docs/suite-format.md, "Counterparts"). The scenario is the demo team's.
 */
export const DEMO_AGREEMENT_SUITES: SuiteInput[] = [
  {
    id: 'sqrt-agrees-with-half-power',
    version: 1,
    title: 'sqrt(z) and z^(1/2) are one function',
    story:
      'Ines moved a filter design from sqrt(z) to pow(z, 0.5) so that one code path handles every root degree, and the phase of a few poles just below the negative real axis flipped. Both spell the principal square root: √z = exp(½·Log z) (DLMF §4.2(iv) with 4.2.7) and z^w = exp(w·Log z) (DLMF 4.2.26), and under signed zeros both are continuous onto the cut from the side the zero says (ISO/IEC 9899:2011 G.6.4.2 csqrt, G.6.3.2 clog), so sqrt(−4 − 0i) and pow(−4 − 0i, 0.5) are both −2i. The suite asks the library for both at the same points, on the cut with either zero, on both sides of it down to the least subnormal, at vertices 1e-6 and 1e-9 below it, and around a circle that crosses it. The value tolerance is relative 1e-12: this suite is about which side of the cut each way lands on, not about the last digits of pow, which goes through exp and log.',
    subject: 'sqrt(z)',
    branch: { kind: 'principal' },
    convention: 'signed-zero',
    paths: [
      {
        kind: 'points',
        name: 'on the cut with either zero',
        points: [
          z('-4', '0'),
          z('-4', '-0'),
          z('-1', '0'),
          z('-1', '-0'),
          z('-0.25', '-0'),
          z('-1e300', '-0'),
          z('4', '0'),
          z('4', '-0'),
        ],
      },
      {
        kind: 'straddle',
        name: 'straddle the cut',
        cut: { kind: 'ray', from: z('0', '0'), through: z('-1', '0') },
        along: ['0.5', '1', '3', '1e6'],
        offsets: ['1e-3', '1e-9', '1e-300', '5e-324'],
      },
      {
        kind: 'polyline',
        name: 'vertices just below the cut',
        points: [z('-3', '1'), z('-2.5', '-1e-6'), z('-1.5', '-1e-9'), z('-1', '1')],
        samples: 9,
      },
      {
        kind: 'circle',
        name: 'around 0, across the cut',
        center: z('0', '0'),
        radius: '2',
        start_angle: '0',
        turns: '1',
        direction: 'ccw',
        samples: 65,
      },
    ],
    tolerances: { values: { relative: 1e-12 } },
    properties: [],
    counterparts: [{ subject: 'z^(1/2)' }],
  },
];
