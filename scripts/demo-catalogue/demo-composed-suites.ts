import type { SuiteInput } from '../../shared/schemas/suite-schema';
import { DEMO_VALUE_TOLERANCE } from './demo-value-tolerance';

const z = (re: string, im: string) => ({ re, im });

/**
 * Principal suites of composed subjects, which a library evaluates one operation at a time: a
 * failure lists every step's value beside the reference's and names the first that left it.
 * Their ids carry "-principal-" without a convention suffix, so the seeded plans (which take the
 * "-sz", "-ccw" and regular suites) keep their shard counts. The scenario is the demo team's.
 */
export const DEMO_COMPOSED_SUITES: SuiteInput[] = [
  {
    id: 'log-of-a-power-principal-steps',
    version: 1,
    title: 'log(z¹³) on the upper edge of the negative real axis, step by step',
    story:
      'Hanne’s signal code takes log(z^13) of points just above the negative real axis. (−x + 0i)^13 = −x^13 + 0i exactly, and log there is log(x^13) + iπ (ISO/IEC 9899:2011 G.6.3.2 and DLMF 4.2.3). A pow computed as exp(13·log z) leaves a tiny imaginary part of either sign, and log then lands on the other side of its cut: the finding names pow as the step that left the reference, not the input’s zero sign.',
    subject: 'log(z^13)',
    branch: { kind: 'principal' },
    convention: 'signed-zero',
    paths: [
      {
        kind: 'segment',
        name: 'upper edge of the negative real axis',
        from: z('-2', '0'),
        to: z('-0.5', '0'),
        samples: 7,
      },
    ],
    tolerances: { values: DEMO_VALUE_TOLERANCE },
    properties: [],
  },
];
