import { discoverTargets } from '../../../../harness/adapters/discover-targets';
import type { Target } from '../../../../harness/adapters/target';
import { evaluateSuite } from '../../../../harness/runner/evaluation/evaluate-suite';
import type { SuiteTargetResult } from '../../../../shared/run-result';
import { seededReferenceCache } from '../../../setup/seeded-reference-cache';
import { makeSuite } from '../support/make-suite';

const cache = seededReferenceCache();
const cmath = discoverTargets().find((t) => t.library === 'cmath');
const opened: Target[] = [];
afterAll(() => Promise.all(opened.map((t) => t.close())));

/** sqrt on both sides of its cut (−∞, 0], at ±0 and a little off it, under counter-clockwise continuity. */
const ccwSuite = makeSuite({
  subject: 'sqrt(z)',
  convention: 'counter-clockwise',
  paths: [
    {
      kind: 'points',
      name: 'on and beside the cut',
      points: [
        { re: '-4', im: '0' },
        { re: '-4', im: '-0' },
        { re: '-4', im: '1e-300' },
        { re: '-4', im: '-1e-300' },
        { re: '4', im: '-0' },
      ],
    },
  ],
});
const labels = (r: SuiteTargetResult) => r.paths.flatMap((p) => p.findings.map((f) => f.outcome.kind));

(cmath ? describe : describe.skip)('a target that states its convention', () => {
  it('counts a −0 input on a cut as not applicable to a counter-clockwise suite, and checks every other point', async () => {
    const target = cmath!.open();
    opened.push(target);
    expect(target.convention).toBe('signed-zero');
    const r = await evaluateSuite(ccwSuite, target, { cache });
    // ISO/IEC 9899:2011 G.6.4.2: csqrt(−4 − 0i) = −2i, where counter-clockwise continuity (Kahan 1987)
    // gives +2i; cmath follows the former, as it states. The other four points mean the same under both.
    expect(r.counts).toEqual({ pass: 4, fail: 0, error: 0, skipped: 0, notApplicable: 1 });
    expect(r.paths[0]!.notApplicable).toEqual([
      { reason: expect.stringContaining('states the signed-zero convention'), count: 1 },
    ]);
  });

  it('holds a target that states no convention to the suite’s own, so the same point is a cut-side finding', async () => {
    const inner = cmath!.open();
    opened.push(inner);
    const unstated: Target = Object.assign(Object.create(inner) as Target, { convention: undefined });
    const r = await evaluateSuite(ccwSuite, unstated, { cache });
    expect(r.counts).toMatchObject({ pass: 4, fail: 1, notApplicable: 0 });
    expect(labels(r)).toEqual(['fail']);
  });
});
