import type { SuiteInput } from '../../shared/schemas/suite-schema';
import { DEMO_VALUE_TOLERANCE } from './demo-value-tolerance';

const z = (re: string, im: string) => ({ re, im });

/**
 * Suites about how values get into a library (shared/target-entry.ts). The story is ours: a
 * maintainer refactors the constructor and a `x || 0` guard against undefined turns every −0
 * into +0; every function still passes its own tests, since they build their inputs by
 * assigning parts. This suite builds its inputs as users do and holds log to the side of its
 * cut that the zero sign picks.
 */
export const DEMO_ENTRY_SUITES: SuiteInput[] = [
  {
    id: 'log-through-the-constructor-keeps-minus-zero',
    version: 1,
    title: 'log below its cut, with −0 built by the constructor',
    story:
      'Under signed zeros, log(x − 0i) for x < 0 is ln|x| − πi and log(x + 0i) is ln|x| + πi (ISO/IEC 9899:2011 G.6.3.2: clog(conj(z)) = conj(clog(z)), clog(−x + i0) = ln x + iπ). The inputs are built with the library’s documented constructor from two numbers, as a user builds them, so a constructor that loses the −0 (say, through `im || 0`) sends every point below the cut to the side above it, and each is reported as the zero sign of the input. The +0 path is the control: it passes whether or not the constructor keeps −0; the straddle checks the points on both sides of the cut too. Run it across versions with `sheetkeeper matrix --suite log-through-the-constructor-keeps-minus-zero --library complex.js --entry complex,object,array,string` to see which release drops −0 at which entry.',
    subject: 'log(z)',
    entry: 'complex',
    branch: { kind: 'principal' },
    convention: 'signed-zero',
    paths: [
      { kind: 'segment', name: 'just below the cut (im −0)', from: z('-4', '-0'), to: z('-0.25', '-0'), samples: 8 },
      { kind: 'segment', name: 'just above the cut (im +0)', from: z('-4', '0'), to: z('-0.25', '0'), samples: 8 },
      {
        kind: 'straddle',
        name: 'across the cut',
        cut: { kind: 'ray', from: z('0', '0'), through: z('-1', '0') },
        along: ['0.5', '2'],
        offsets: ['1e-3', '1e-9', '1e-300', '5e-324'],
      },
    ],
    // The catalogue's principal-branch tolerance (demo-value-tolerance.ts): a side of the cut is π apart, far beyond either bound.
    tolerances: { values: DEMO_VALUE_TOLERANCE },
    properties: [],
  },
];
