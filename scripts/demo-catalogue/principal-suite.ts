import { createHash } from 'node:crypto';
import type { Convention } from '../../shared/schemas/convention-schema';
import type { SuiteInput } from '../../shared/schemas/suite-schema';
import type { SuitePathInput } from '../../shared/schemas/suite-path-schema';
import type { DemoCut, DemoPrincipalFunction } from '../../harness';
import { DEMO_VALUE_TOLERANCE } from './demo-value-tolerance';
import { principalSuiteTitle } from './principal-suite-title';

const c = (p: [string, string]) => ({ re: p[0], im: p[1] });

/** A pinned seed per (suite, law), so re-generating the catalogue changes no seed. */
const seedOf = (text: string) => createHash('sha256').update(text).digest().readUInt32BE(0) & 0x7fffffff;

function straddle(cut: DemoCut, index: number): SuitePathInput {
  return cut.kind === 'ray'
    ? {
        kind: 'straddle',
        name: `straddle cut ${index + 1}`,
        cut: { kind: 'ray', from: c(cut.from), through: c(cut.through) },
        along: ['0.5', '1', '3', '1e6'],
      }
    : {
        kind: 'straddle',
        name: `straddle cut ${index + 1}`,
        cut: { kind: 'segment', from: c(cut.from), to: c(cut.to) },
        along: ['0.125', '0.25', '0.5', '0.75', '0.875'],
      };
}

/**
 * A principal-branch suite for one function under one convention: a straddle on every cut
 * (offsets 1e-3, 1e-9, 1e-300, 5e-324 on both sides, and the cut itself with +0 and −0), a
 * circle around every finite branch point (65 samples, so quarter turns land exactly on the
 * axes), a wide circle, and the function's property laws.
 */
export function principalSuite(fn: DemoPrincipalFunction, convention: Convention): SuiteInput {
  const short = convention === 'signed-zero' ? 'sz' : 'ccw';
  const id = `${fn.slug}-principal-${short}`;
  const paths: SuitePathInput[] = [
    ...fn.cuts.map(straddle),
    ...fn.branchPoints.map((bp, i): SuitePathInput => ({
      kind: 'circle',
      name: `around branch point ${i + 1}`,
      center: c(bp),
      radius: fn.radius,
      start_angle: '0',
      turns: '1',
      direction: 'ccw',
      samples: 65,
    })),
    {
      kind: 'circle',
      name: 'wide circle',
      center: { re: '0', im: '0' },
      radius: '3',
      start_angle: 'pi/8',
      turns: '1',
      direction: 'ccw',
      samples: 49,
    },
  ];
  return {
    id,
    version: 1,
    title: principalSuiteTitle(fn, convention),
    story: fn.story,
    subject: fn.subject,
    branch: { kind: 'principal' },
    convention,
    paths,
    // properties: t = 16 ulps, read as 16·2^−52 normwise for each library value in a law
    // (harness/properties/law-tolerance.ts). The laws test structure (sides, signs, identities);
    // accuracy is the value checks' job, against the correctly rounded reference. 16 eps is four
    // times what a value within DEMO_VALUE_TOLERANCE (4 ulps per part, or 4 eps normwise) can be
    // off normwise, so a value that passes its value check never fails a law by accuracy alone,
    // and it is far below what a wrong side or sign moves a value. Careful implementations
    // publish bounds of a few ulps per part for these functions (Hull, Fairgrieve and Tang, ACM
    // TOMS 23(3), 1997, for casin and cacos: figure from memory). Each law then scales t by the
    // condition of what it composes: its `allowance`, which every check's title states
    // (complex.js 2.4.3 against the demo: docs/property-results.md).
    tolerances: { values: DEMO_VALUE_TOLERANCE, properties: { ulps: 16 } },
    properties: fn.laws.map((law) => ({ ...law, runs: 300, seed: seedOf(`${id}/${law.law}`) })),
  };
}
