import fc from 'fast-check';
import type { Diagnosis } from '../../../../shared/diagnosis';
import type { SuiteTargetResult } from '../../../../shared/run-result';
import type { Target } from '../../../../harness/adapters/target';
import { evaluateSuite } from '../../../../harness/runner/evaluation/evaluate-suite';
import { describeOutcome } from '../../../../harness/runner/formats/describe-outcome';
import { seededReferenceCache } from '../../../setup/seeded-reference-cache';
import { makeSuite } from '../support/make-suite';
import { referenceTarget } from '../support/reference-target';

const cache = seededReferenceCache();
const diagnoses = (r: SuiteTargetResult): Diagnosis[] =>
  r.paths.flatMap((p) => p.findings.flatMap((f) => (f.outcome.kind === 'fail' ? [f.outcome.diagnosis] : [])));

// The unit circle about 0, 65 samples: the steps are 2π/64 ≈ 0.098 rad apart, and the angle 1 rad
// falls between samples 10 and 11. √z is continuous there (DLMF 4.2.14: its only cut is (−∞, 0]).
const suite = makeSuite({
  subject: 'sqrt(z)',
  paths: [
    {
      kind: 'circle',
      name: 'unit circle',
      center: { re: '0', im: '0' },
      radius: '1',
      start_angle: '0',
      turns: '1',
      direction: 'ccw',
      samples: 65,
    },
  ],
});
const angle = (z: readonly number[]): number => Math.atan2(z[1] as number, z[0] as number);

describe('confirmJumps through evaluateSuite', () => {
  it('keeps the points’ own labels beyond a steep but continuous stretch of the library', async () => {
    // Adds 0.5 + atan((θ − 1)/1e−6)/π to the real part: a rise of 1 over about 1e−6 rad, continuous.
    const steep = referenceTarget('steep@1', (op, [z], v) =>
      op === 'sqrt' ? [v[0] + 0.5 + Math.atan((angle(z!) - 1) / 1e-6) / Math.PI, v[1]] : v,
    );
    const r = await evaluateSuite(suite, steep, { cache });
    const found = diagnoses(r);
    expect(found.length).toBeGreaterThan(10);
    expect(r.paths[0]!.jumps!.library.length).toBeGreaterThan(r.paths[0]!.jumps!.expected.length);
    expect(found.filter((d) => d.kind === 'misplaced-cut')).toEqual([]);
  });

  it('refines a jump through the entry the points went in through, not the target’s default', async () => {
    // The steep but continuous rise of the first test lives only behind the entry "steep"; the
    // default entry is a perfect √. Midpoints built through the default would make the rise look
    // like a jump that stays (a false misplaced cut).
    const steep = referenceTarget('two-ways@1', (op, [z], v) =>
      op === 'sqrt' ? [v[0] + 0.5 + Math.atan((angle(z!) - 1) / 1e-6) / Math.PI, v[1]] : v,
    );
    const plain = referenceTarget('two-ways@1');
    const carries = { imaginaryPart: true, realZeroSign: true, imaginaryZeroSign: true };
    const twoWays: Target = {
      ...plain,
      entries: [
        { name: 'plain', call: 'plain(re, im)', default: true, carries },
        { name: 'steep', call: 'steep(re, im)', default: false, carries },
      ],
      evaluate: (op, calls, entry) => (entry === 'steep' ? steep : plain).evaluate(op, calls),
    };
    const r = await evaluateSuite({ ...suite, entry: 'steep' }, twoWays, { cache });
    const found = diagnoses(r);
    expect(found.length).toBeGreaterThan(10);
    expect(found.filter((d) => d.kind === 'misplaced-cut')).toEqual([]);
  });

  it('calls a jump that stays under refinement a confirmed misplaced cut', async () => {
    // Conjugates √z for 1 < θ < π: the library's cut moved to the ray at angle 1, a jump of 2 sin ½.
    const moved = referenceTarget('moved-cut@1', (op, [z], v) =>
      op === 'sqrt' && angle(z!) > 1 && angle(z!) < Math.PI ? [v[0], -v[1]] : v,
    );
    const r = await evaluateSuite(suite, moved, { cache });
    const misplaced = diagnoses(r).filter((d) => d.kind === 'misplaced-cut');
    expect(misplaced.length).toBeGreaterThan(10);
    expect(misplaced[0]).toEqual({
      kind: 'misplaced-cut',
      libraryJumpAt: expect.closeTo(10.5 / 64, 12),
      expectedJumpAt: null,
      confirmed: true,
    });
    const listed = r.paths[0]!.findings.find(
      (f) => f.outcome.kind === 'fail' && f.outcome.diagnosis.kind === 'misplaced-cut',
    )!;
    expect(describeOutcome(listed.outcome)).toMatch(
      /^misplaced-cut \(library jumps at t ≈ 0\.164, expected none; confirmed by refining between the samples\)$/,
    );
  });

  it('law: a continuous rise of any height 0.5–2 and width 1e-10–1e-2 rad is never a misplaced cut, and a jump of the same height always is (seed 20261205)', async () => {
    // Widths down to 1e−10 rad: 40 halvings of a 0.098 rad step reach 9e−14 rad, below them.
    await fc.assert(
      fc.asyncProperty(
        fc.double({ min: 0.2, max: 2.8, noNaN: true }),
        fc.double({ min: -10, max: -2, noNaN: true }),
        fc.double({ min: 0.5, max: 2, noNaN: true }),
        async (at, log10Width, height) => {
          const width = 10 ** log10Width;
          const rise = referenceTarget('rise@1', (op, [z], v) =>
            op === 'sqrt' ? [v[0] + height * (0.5 + Math.atan((angle(z!) - at) / width) / Math.PI), v[1]] : v,
          );
          const jump = referenceTarget('jump@1', (op, [z], v) =>
            op === 'sqrt' && angle(z!) > at ? [v[0] + height, v[1]] : v,
          );
          const continuous = diagnoses(await evaluateSuite(suite, rise, { cache }));
          const jumped = diagnoses(await evaluateSuite(suite, jump, { cache }));
          return (
            continuous.every((d) => d.kind !== 'misplaced-cut') &&
            jumped.length > 0 &&
            jumped.some((d) => d.kind === 'misplaced-cut' && d.confirmed === true)
          );
        },
      ),
      { seed: 20261205, numRuns: 25 },
    );
  });
});
