import type { Diagnosis } from '../../../../shared/diagnosis';
import type { PointFinding, SuiteTargetResult } from '../../../../shared/run-result';
import { evaluateSuite } from '../../../../harness/runner/evaluation/evaluate-suite';
import { mutantTarget } from '../../../../harness/runner/evaluation/mutant-target';
import { seededReferenceCache } from '../../../setup/seeded-reference-cache';
import { loadDemoSuite } from '../support/load-demo-suite';
import { makeSuite } from '../support/make-suite';
import { referenceTarget } from '../support/reference-target';
import { suiteSegment } from '../support/suite-segment';

const cache = seededReferenceCache();
const findings = (r: SuiteTargetResult): PointFinding[] => r.paths.flatMap((p) => p.findings);
const diagnosis = (f: PointFinding): Diagnosis | null => (f.outcome.kind === 'fail' ? f.outcome.diagnosis : null);

/** The negative real axis from −1 to −1/2, on its upper (+0) edge. */
const UPPER_EDGE = suiteSegment('upper edge', ['-1', '0'], ['-0.5', '0'], 3);

// A library whose pow goes through exp(w·log z) with the product rounded, as complex.js 2.4.3
// does: pow(−1 + 0i, 13) = exp(13·iπ) = −1 − 1.9606728399089416e−15i, where the exact power is
// (−1)^13 = −1 with the zero imaginary part of (−1 + 0i)^13 (every product of real numbers).
const viaExpLog = mutantTarget(referenceTarget('exp-log-pow@1'), 'inexact-intermediate');

describe('traceSteps', () => {
  it('names the step that left the reference and calls log(z^13) on the other side of the cut, not a zero sign of the input', async () => {
    const suite = makeSuite({ subject: 'log(z^13)', paths: [UPPER_EDGE] });
    const r = await evaluateSuite(suite, viaExpLog, { cache });
    const f = findings(r).find((x) => x.z.re === '-1')!;
    // ISO/IEC 9899:2011 G.6.3.2 and DLMF 4.2.3: log(−1 + 0i) = iπ; the library's −1 − 1.96e−15i
    // lies below the cut, where log is −iπ: the value is the other side's limit.
    expect(f.expected).toEqual({ re: '0', im: '3.141592653589793' });
    expect(diagnosis(f)).toEqual({ kind: 'cut-side' });
    expect(f.firstLeftStep).toBe(0);
    expect(f.steps).toEqual([
      {
        text: 'pow(z, 13)',
        library: { re: '-1', im: '-1.9606728399089416e-15' },
        reference: { re: '-1', im: '0' },
        left: true,
      },
      {
        text: 'log(pow(z, 13))',
        // log|z| of the library's power is 1.9e−30, correctly rounded by this library.
        library: { re: '1.922118992578297e-30', im: '-3.1415926535897913' },
        reference: { re: '0', im: '3.141592653589793' },
        left: true,
      },
    ]);
    expect(r.byDiagnosis['zero-sign']).toBeUndefined();
  });

  it('keeps a zero sign of the input where every step before the last matched the reference', async () => {
    // log ignores −0: log(−1 − 0i) must be −iπ (ISO/IEC 9899:2011 G.6.3.2, conj symmetry); the
    // power before it is exact, so the input's zero sign read wrongly is the story.
    const ignoresMinusZero = referenceTarget('log-ignores-minus-zero@1', (op, [z], v) =>
      op === 'log' && Object.is(z![1], -0) ? [v[0], -v[1]] : v,
    );
    const suite = makeSuite({
      subject: 'log(z^13)',
      paths: [suiteSegment('lower edge', ['-1', '-0'], ['-0.5', '-0'], 3)],
    });
    const r = await evaluateSuite(suite, ignoresMinusZero, { cache });
    const f = findings(r).find((x) => x.z.re === '-1')!;
    expect(diagnosis(f)).toEqual({ kind: 'zero-sign', part: 'im', of: 'input' });
    expect(f.firstLeftStep).toBe(1);
    expect(f.steps?.map((s) => s.left)).toEqual([false, true]);
  });

  it('keeps a zero sign of the input read wrongly by an inner step, and names that step', async () => {
    // √(−1.8 − 0i) = −1.3416i (ISO/IEC 9899:2011 G.6.4.2: csqrt(conj z) = conj(csqrt z)); a sqrt
    // that ignores −0 answers +1.3416i from the exact argument z − 1 = −1.8 − 0i: the input's zero
    // was misread, not lost, and the steps say where.
    const ignoresMinusZero = referenceTarget('sqrt-ignores-minus-zero@1', (op, [z], v) =>
      op === 'sqrt' && Object.is(z![1], -0) ? [v[0], -v[1]] : v,
    );
    const suite = makeSuite({
      subject: 'sqrt(z - 1) * 2',
      paths: [suiteSegment('lower edge', ['-0.8', '-0'], ['-0.4', '-0'], 2)],
    });
    const r = await evaluateSuite(suite, ignoresMinusZero, { cache });
    const f = findings(r).find((x) => x.z.re === '-0.8')!;
    expect(diagnosis(f)).toEqual({ kind: 'zero-sign', part: 'im', of: 'input' });
    expect(f.steps?.map((s) => [s.text, s.left])).toEqual([
      ['z - 1', false],
      ['sqrt(z - 1)', true],
      ['sqrt(z - 1) * 2', true],
    ]);
    expect(f.firstLeftStep).toBe(1);
  });

  it('does not call an arithmetic step left by the sign of an exact zero, which follows the formula', async () => {
    // (−1.5 − 0i)/(0.5 + 0i): −3 + 0i through a·conj(b)/|b|² (the reference), −3 − 0i dividing each
    // part by a real divisor (complex.js 2.4.3); its sqrt then ignores −0, which is the finding.
    const likeComplexJs = referenceTarget('divides-parts@1', (op, [a, b], v) => {
      if (op === 'div' && b![1] === 0) return [a![0] / b![0], a![1] / b![0]];
      if (op === 'sqrt' && Object.is(a![1], -0)) return [v[0], -v[1]];
      return v;
    });
    // The regular branch of the demo suite takes its lower side at −0.5 − 0i: −i√3.
    const r = await evaluateSuite(loadDemoSuite('sqrt-of-a-moebius-map-with-a-pole'), likeComplexJs, { cache });
    const f = findings(r).find((x) => x.path === 'across the cut' && x.z.re === '-0.5')!;
    expect(f.expected).toEqual({ re: '-0', im: '-1.7320508075688772' });
    expect(f.steps?.[2]).toEqual({
      text: '(z - 1) / (z + 1)',
      library: { re: '-3', im: '-0' },
      reference: { re: '-3', im: '0' },
      left: false,
    });
    expect(f.firstLeftStep).toBe(3);
    expect(diagnosis(f)).toEqual({ kind: 'zero-sign', part: 'im', of: 'input' });
  });

  it('lists no steps for a single call', async () => {
    const suite = makeSuite({ subject: 'z^13', paths: [UPPER_EDGE] });
    const r = await evaluateSuite(suite, viaExpLog, { cache });
    expect(findings(r).length).toBeGreaterThan(0);
    expect(findings(r).every((f) => f.steps === undefined && f.firstLeftStep === undefined)).toBe(true);
  });

  it('passes a subject whose steps all match the reference, with nothing to trace', async () => {
    const suite = makeSuite({ subject: 'log(z^13)', paths: [UPPER_EDGE] });
    const r = await evaluateSuite(suite, referenceTarget(), { cache });
    expect(r.counts.fail).toBe(0);
  });
});
