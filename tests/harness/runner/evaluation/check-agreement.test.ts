import type { ComplexPair } from '../../../../harness/adapters/complex-pair';
import type { Target } from '../../../../harness/adapters/target';
import { evaluateSuite } from '../../../../harness/runner/evaluation/evaluate-suite';
import { outcomeLabels } from '../../../../shared/outcome-labels';
import type { PointFinding, SuiteTargetResult } from '../../../../shared/run-result';
import type { SuiteInput } from '../../../../shared/schemas/suite-schema';
import { seededReferenceCache } from '../../../setup/seeded-reference-cache';
import { makeSuite } from '../support/make-suite';
import { referenceTarget } from '../support/reference-target';

const cache = seededReferenceCache();

// ISO/IEC 9899:2011 G.6.4.2: csqrt(−4 − 0i) = +0 − 2i and csqrt(−4 + 0i) = +0 + 2i. The principal
// z^w is exp(w·Log z) (DLMF 4.2.26) and clog(−4 − 0i) = ln 4 − iπ (G.6.3.2), so the principal
// z^(1/2) has the same values on both sides of the cut.
const POINTS: SuiteInput['paths'] = [
  {
    kind: 'points',
    name: 'both zeros at -4',
    points: [
      { re: '-4', im: '0' },
      { re: '-4', im: '-0' },
      { re: '4', im: '0' },
    ],
  },
];
const sqrtAgainstPow = makeSuite({ subject: 'sqrt(z)', paths: POINTS, counterparts: [{ subject: 'z^(1/2)' }] });
const findings = (r: SuiteTargetResult): PointFinding[] => r.paths.flatMap((p) => p.findings);
const atMinusZero = (r: SuiteTargetResult) => findings(r).find((f) => f.z.re === '-4' && f.z.im === '-0');
/** A library whose pow ignores the sign of a zero imaginary part of its base (computes at +0). */
const powIgnoresMinusZero = (op: string, [z]: ComplexPair[], v: [number, number]): [number, number] =>
  op === 'pow' && Object.is(z![1], -0) && z![0] < 0 ? [v[0], -v[1]] : v;

describe('agreement checks', () => {
  it('labels a point where sqrt(z) and z^(1/2) land on different sides of the cut a disagreement, naming which left the reference', async () => {
    const r = await evaluateSuite(sqrtAgainstPow, referenceTarget('pow-drops-zero@1', powIgnoresMinusZero), { cache });
    expect(r.counts).toEqual({ pass: 2, fail: 1, error: 0, skipped: 0, notApplicable: 0 });
    const f = atMinusZero(r)!;
    expect(f.actual).toEqual({ re: '0', im: '-2' });
    expect(f.expected).toEqual({ re: '0', im: '-2' });
    expect(outcomeLabels(f.outcome)).toEqual([
      { kind: 'disagreement', with: 'z^(1/2)', other: { re: '0', im: '2' }, otherMatchesReference: false },
    ]);
    expect(r.byDiagnosis).toEqual({ disagreement: 1 });
    expect(r.byClass).toEqual({ branch: 1, accuracy: 0 });
    expect(r.paths[0]!.agreements).toEqual([{ with: 'z^(1/2)', compared: 3, disagreed: 1, oneSided: [] }]);
    // Both ways can be reproduced: the suite's sqrt and the counterpart's pow.
    expect(f.reproducer).toContain('sqrt');
    expect(f.reproducer).toContain('pow');
  });

  it("adds the disagreement to a failing point's own label and says the other value is the reference's", async () => {
    const sqrtIgnoresMinusZero = referenceTarget('sqrt-drops-zero@1', (op, [z], v) =>
      op === 'sqrt' && Object.is(z![1], -0) ? [v[0], -v[1]] : v,
    );
    const r = await evaluateSuite(sqrtAgainstPow, sqrtIgnoresMinusZero, { cache });
    expect(outcomeLabels(atMinusZero(r)!.outcome)).toEqual([
      { kind: 'zero-sign', part: 'im', of: 'input' },
      { kind: 'disagreement', with: 'z^(1/2)', other: { re: '0', im: '-2' }, otherMatchesReference: true },
    ]);
    expect(r.counts.fail).toBe(1);
    expect(r.byDiagnosis).toEqual({ 'zero-sign': 1, disagreement: 1 });
  });

  it('passes when both ways agree, and says where only one of them gave a value instead of disagreeing', async () => {
    expect((await evaluateSuite(sqrtAgainstPow, referenceTarget(), { cache })).counts).toEqual({
      pass: 3,
      fail: 0,
      error: 0,
      skipped: 0,
      notApplicable: 0,
    });
    const powRefusesPositive = referenceTarget('pow-refuses@1', (op, [z], v) => {
      if (op === 'pow' && z![0] > 0) throw new Error('not today');
      return v;
    });
    const r = await evaluateSuite(sqrtAgainstPow, powRefusesPositive, { cache });
    expect(r.counts.fail).toBe(0);
    expect(r.paths[0]!.agreements).toEqual([
      {
        with: 'z^(1/2)',
        compared: 2,
        disagreed: 0,
        oneSided: [{ reason: 'only sqrt(z) gave a value (z^(1/2): pow: not today)', count: 1 }],
      },
    ]);
  });

  it('does not call two values that each pass against the reference a disagreement, though they are further apart than the tolerance', async () => {
    // sqrt(4) = 2 exactly; this library's pow gives 2 + 3 ulps and its sqrt 2 − 3 ulps: 6 ulps apart, each 3 from 2.
    const ulpAbove2 = 2 ** -51;
    const ulpBelow2 = 2 ** -52;
    const apart = referenceTarget('both-close@1', (op, _args, v) =>
      v[0] === 2 ? [op === 'pow' ? 2 + 3 * ulpAbove2 : op === 'sqrt' ? 2 - 3 * ulpBelow2 : v[0], v[1]] : v,
    );
    const r = await evaluateSuite(sqrtAgainstPow, apart, { cache });
    expect(r.counts.fail).toBe(0);
    expect(r.paths[0]!.agreements![0]).toMatchObject({ compared: 3, disagreed: 0 });
  });

  it('compares one subject through two entries of the target', async () => {
    // A small target with an entry that builds its numbers from parts that lose a −0 (as a
    // constructor from plain numbers may); the default entry keeps the bits.
    const base = referenceTarget('two-entries@1');
    const dropZeroSign = (x: number) => (x === 0 ? 0 : x);
    const twoEntries: Target = {
      ...base,
      evaluate: (op, calls, entry) =>
        base.evaluate(
          op,
          entry === 'loses-zero-sign'
            ? calls.map((args) => args.map(([re, im]) => [dropZeroSign(re), dropZeroSign(im)]))
            : calls,
        ),
    };
    const suite = makeSuite({ subject: 'sqrt(z)', paths: POINTS, counterparts: [{ entry: 'loses-zero-sign' }] });
    const r = await evaluateSuite(suite, twoEntries, { cache });
    expect(outcomeLabels(atMinusZero(r)!.outcome)).toEqual([
      {
        kind: 'disagreement',
        with: 'sqrt(z) through entry loses-zero-sign',
        other: { re: '0', im: '2' },
        otherMatchesReference: false,
      },
    ]);
    expect(r.counts).toEqual({ pass: 2, fail: 1, error: 0, skipped: 0, notApplicable: 0 });
  });
});
