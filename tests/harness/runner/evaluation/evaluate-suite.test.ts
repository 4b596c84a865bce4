import { discoverTargets } from '../../../../harness/adapters/discover-targets';
import { NOTHING_CHECKED } from '../../../../harness/runner/evaluation/pair-status';
import type { Diagnosis } from '../../../../shared/diagnosis';
import type { PointFinding, SuiteTargetResult } from '../../../../shared/run-result';
import type { ComplexPair } from '../../../../harness/adapters/complex-pair';
import type { Target } from '../../../../harness/adapters/target';
import { evaluateSuite } from '../../../../harness/runner/evaluation/evaluate-suite';
import { seededReferenceCache } from '../../../setup/seeded-reference-cache';
import { loadDemoSuite } from '../support/load-demo-suite';
import { makeSuite } from '../support/make-suite';
import { referenceTarget } from '../support/reference-target';

const cache = seededReferenceCache();
const findings = (r: SuiteTargetResult): PointFinding[] => r.paths.flatMap((p) => p.findings);
const diagnosis = (f: PointFinding): Diagnosis | null => (f.outcome.kind === 'fail' ? f.outcome.diagnosis : null);
const ROTATE: ComplexPair = [Math.cos((2 * Math.PI) / 3), Math.sin((2 * Math.PI) / 3)];

describe('evaluateSuite', () => {
  it('passes a correctly rounded Annex G library on every point of the sqrt and log demo suites', async () => {
    for (const id of ['sqrt-principal-sz', 'log-principal-sz', 'asin-principal-sz']) {
      const r = await evaluateSuite(loadDemoSuite(id), referenceTarget(), { cache });
      expect({ id, status: r.status, counts: r.counts }).toEqual({
        id,
        status: 'pass',
        counts: { pass: r.checked.points, fail: 0, error: 0, skipped: 0, notApplicable: 0 },
      });
    }
  });

  it('calls an ignored −0 on the cut of sqrt a zero sign of the input, with the exact bits, both limits, the Annex G clause and a reproducer', async () => {
    // ISO/IEC 9899:2011 G.6.4.2: csqrt(x − 0i) = +0 − i√|x| for x < 0; this library computes at +0.
    const ignoresMinusZero = referenceTarget('loses-minus-zero@1', (op, [z], v) =>
      op === 'sqrt' && Object.is(z![1], -0) ? [v[0], -v[1]] : v,
    );
    const r = await evaluateSuite(loadDemoSuite('sqrt-principal-sz'), ignoresMinusZero, { cache });
    expect(r.status).toBe('fail');
    const onCut = findings(r).find((f) => f.label === 'on -0' && f.z.re === '-1')!;
    expect(diagnosis(onCut)).toEqual({ kind: 'zero-sign', part: 'im', of: 'input' });
    expect(onCut.zHex).toEqual({ re: '-0x1p+0', im: '-0x0p+0' });
    expect(onCut.expected).toEqual({ re: '0', im: '-1' });
    expect(onCut.actual).toEqual({ re: '0', im: '1' });
    expect(onCut.limits).toEqual({
      sides: ['from above (Im z = +0)', 'from below (Im z = −0)'],
      values: [
        { re: '0', im: '1' },
        { re: '0', im: '-1' },
      ],
    });
    expect(onCut.rule).toContain('G.6.4.2');
    expect(onCut.reproducer).toContain('sqrt');
    expect(r.byDiagnosis).toEqual({ 'zero-sign': r.counts.fail });
  });

  it('calls a right value with a zero part of the wrong sign a zero sign of the output', async () => {
    const flipsZeroRe = referenceTarget('flips-output@1', (op, _args, v) =>
      op === 'sqrt' && v[0] === 0 ? [-v[0], v[1]] : v,
    );
    const r = await evaluateSuite(loadDemoSuite('sqrt-principal-sz'), flipsZeroRe, { cache });
    const f = findings(r).find((x) => x.label === 'on +0' && x.z.re === '-1')!;
    expect(diagnosis(f)).toEqual({ kind: 'zero-sign', part: 're', of: 'output' });
  });

  it('calls the lower-side value on the cut under counter-clockwise continuity the wrong cut side', async () => {
    // Kahan 1987: (−∞, 0] belongs to the upper side, √(−1 − 0i) = i; an Annex G library answers −i.
    const r = await evaluateSuite(loadDemoSuite('sqrt-principal-ccw'), referenceTarget(), { cache });
    const f = findings(r).find((x) => x.label === 'on -0' && x.z.re === '-1')!;
    expect(diagnosis(f)).toEqual({ kind: 'cut-side' });
    expect(f.rule).toContain('Kahan');
    expect(r.byDiagnosis).toEqual({ 'cut-side': r.counts.fail });
  });

  it('calls a cube root turned by e^{2πi/3} the sheet k = 1, and log + 2πi the sheet k = 1', async () => {
    const rotated = referenceTarget('rotated@1', (op, _args, v) =>
      op === 'pow' ? [v[0] * ROTATE[0] - v[1] * ROTATE[1], v[0] * ROTATE[1] + v[1] * ROTATE[0]] : v,
    );
    const r = await evaluateSuite(loadDemoSuite('pow-third-principal-sz'), rotated, { cache });
    expect(r.counts.pass).toBe(0);
    // Off the cut every value is on the sheet k = 1. Across the cut of a cube root the other
    // side's limit is itself the sheet k = ±1 away, so there the cut side (or the zero sign) is named.
    const off = findings(r).filter((f) => f.path !== 'straddle cut 1');
    expect(off.length).toBeGreaterThan(100);
    expect(off.every((f) => diagnosis(f)?.kind === 'other-sheet' && (diagnosis(f) as { k: number }).k === 1)).toBe(
      true,
    );
    const across = findings(r).filter((f) => f.path === 'straddle cut 1');
    expect(new Set(across.map((f) => diagnosis(f)?.kind))).toEqual(new Set(['other-sheet', 'cut-side', 'zero-sign']));
    const shifted = referenceTarget('shifted@1', (op, _args, v) => (op === 'log' ? [v[0], v[1] + 2 * Math.PI] : v));
    const log = await evaluateSuite(loadDemoSuite('log-principal-sz'), shifted, { cache });
    expect(
      findings(log)
        .filter((f) => f.path === 'wide circle')
        .map(diagnosis),
    ).toContainEqual({ kind: 'other-sheet', k: 1 });
  });

  it('calls the points between a cut on the positive axis and the expected one a misplaced cut, with both jumps', async () => {
    // √z with arg z taken in [0, 2π): −(principal) below the real axis.
    const cutOnPositiveAxis = referenceTarget('positive-cut@1', (op, [z], v) =>
      op === 'sqrt' && (z![1] < 0 || Object.is(z![1], -0)) ? [-v[0], -v[1]] : v,
    );
    const r = await evaluateSuite(loadDemoSuite('sqrt-principal-sz'), cutOnPositiveAxis, { cache });
    const wide = r.paths.find((p) => p.name === 'wide circle')!;
    expect(wide.jumps!.expected).toHaveLength(1);
    expect(wide.jumps!.library).toHaveLength(1);
    const d = wide.findings.map(diagnosis);
    expect(d.length).toBeGreaterThan(10);
    expect(d.filter((x) => x?.kind === 'misplaced-cut').length).toBeGreaterThan(d.length / 2);
    const m = d.find((x) => x?.kind === 'misplaced-cut') as Extract<Diagnosis, { kind: 'misplaced-cut' }>;
    expect(m.expectedJumpAt).toBeCloseTo(wide.jumps!.expected[0]!, 12);
    expect(m.libraryJumpAt).toBeCloseTo(wide.jumps!.library[0]!, 12);
  });

  it('calls a value 1e-13 off inaccurate with its ulps, NaN not-finite, nonsense unexplained, and a throw an error', async () => {
    // A grid is not a continuous path, so no jump analysis relabels the nonsense values.
    const suite = makeSuite({
      subject: 'asin(z)',
      paths: [
        {
          kind: 'grid',
          name: 'box',
          min: { re: '0.1', im: '0.5' },
          max: { re: '0.9', im: '0.6' },
          columns: 9,
          rows: 2,
        },
      ],
    });
    const wobble = (op: string, [z]: ComplexPair[], v: [number, number]): [number, number] => {
      if (op !== 'asin') return v;
      if (z![0] < 0.2) return [v[0] * (1 + 1e-13), v[1]];
      if (z![0] < 0.4) return [NaN, v[1]];
      if (z![0] < 0.6) return [v[0] + 10, v[1] - 7];
      if (z![0] < 0.8) throw new Error('asin refused this point');
      return v;
    };
    const r = await evaluateSuite(suite, referenceTarget('wobbly@1', wobble), { cache });
    const at = (re: number) => findings(r).filter((f) => Math.abs(Number(f.z.re) - re) < 1e-9);
    const first = diagnosis(at(0.1)[0]!) as Extract<Diagnosis, { kind: 'inaccurate' }>;
    expect(first.kind).toBe('inaccurate');
    expect(first.ulps).toBeGreaterThan(100);
    expect(at(0.3).map(diagnosis)).toEqual([{ kind: 'not-finite' }, { kind: 'not-finite' }]);
    expect(at(0.5).map((f) => diagnosis(f)?.kind)).toEqual(['unexplained', 'unexplained']);
    expect(at(0.7)[0]!.outcome).toEqual({ kind: 'error', message: 'asin: asin refused this point' });
    expect(at(0.7)[0]!.actual).toBeNull();
    expect(r.counts.error).toBe(4);
    expect(r.counts.pass).toBeGreaterThanOrEqual(2);
    expect(r.status).toBe('error');
  });

  it('gives complex.js 2.4.3’s acsc(−0 − 0.001i) every label: zero sign of the input, and 104,212 ulps off in im', async () => {
    // mpmath, 40 digits: acsc(±0 − 0.001i) = asin(1000i) = ±0 + 7.600902709541988590…i (DLMF 4.23.7);
    // complex.js returns +0 + 7.6009027094494295i: the −0 ignored, and the imaginary part 9.3e−11 off.
    const descriptor = discoverTargets().find((d) => d.name === 'complex.js@2.4.3')!;
    const target = await descriptor.open();
    try {
      const r = await evaluateSuite(loadDemoSuite('acsc-principal-sz'), target, { cache });
      const f = findings(r).find((x) => x.z.re === '-0' && x.z.im === '-0.001')!;
      expect(f.expected).toEqual({ re: '-0', im: '7.600902709541988' });
      expect(f.outcome.kind === 'fail' && f.outcome.labels).toEqual([
        { kind: 'zero-sign', part: 're', of: 'input' },
        expect.objectContaining({
          kind: 'inaccurate',
          ulps: 104212,
          part: 'im',
          parts: { re: { ulps: 0, absolute: 0 }, im: { ulps: 104212, absolute: expect.closeTo(9.26e-11, 12) } },
        }),
      ]);
      expect(diagnosis(f)).toEqual({ kind: 'zero-sign', part: 're', of: 'input' });
      // Counted once as a branch finding, and under both labels.
      expect(r.byClass.branch + r.byClass.accuracy).toBe(r.counts.fail);
      expect(r.byDiagnosis['inaccurate']).toBeGreaterThanOrEqual(1);
    } finally {
      await target.close();
    }
  });

  it('lists branch findings before accuracy findings on a path, and counts the classes', async () => {
    // The lower half of a circle answered on the other side's sheet (−√z, a branch finding), the
    // upper half 1e-13 off (an accuracy finding); index order would list the accuracy ones first.
    const suite = makeSuite({
      subject: 'sqrt(z)',
      paths: [
        {
          kind: 'grid',
          name: 'box',
          min: { re: '0.5', im: '0.5' },
          max: { re: '0.9', im: '0.6' },
          columns: 5,
          rows: 2,
        },
      ],
    });
    const target = referenceTarget('two-faults@1', (_op, [z], v) =>
      z![1] < 0.55 ? [v[0] * (1 + 1e-13), v[1]] : [-v[0], -v[1]],
    );
    const r = await evaluateSuite(suite, target, { cache });
    expect(r.byClass).toEqual({ branch: 5, accuracy: 5 });
    const kinds = findings(r).map((f) => diagnosis(f)?.kind);
    expect(kinds.slice(0, 5).every((k) => k !== 'inaccurate')).toBe(true);
    expect(kinds.slice(5)).toEqual(Array(5).fill('inaccurate'));
  });

  it('skips every point, with the reason and the operations it lacks, when the target lacks an operation of the subject', async () => {
    const noCbrt: Target = { ...referenceTarget(), supports: async (op) => op !== 'cbrt' };
    const r = await evaluateSuite(loadDemoSuite('cbrt-principal-sz'), noCbrt, { cache });
    expect(r.counts).toEqual({ pass: 0, fail: 0, error: 0, skipped: r.checked.points, notApplicable: 0 });
    expect(r.paths[0]!.skipped).toEqual([
      { reason: 'oracle@1 has no cbrt', count: r.paths[0]!.points, lacks: ['cbrt'] },
    ]);
    // Nothing checked is not a pass: a green result for a library without the function would mislead.
    expect(r.status).toBe('error');
    expect(r.errors).toEqual([NOTHING_CHECKED]);
  });

  it('evaluates a composite subject with the library’s own arithmetic and checks a regular branch and its monodromy', async () => {
    const r = await evaluateSuite(loadDemoSuite('sqrt-z2-minus-1-finite-cut'), referenceTarget(), { cache });
    expect(r.counts.fail).toBe(0);
    const around = r.paths.find((p) => p.name === 'around +1')!;
    expect(around.monodromy).toMatchObject({ expected: { re: '-1', im: '0' }, pass: true });
    expect(around.jumps!.expected).toEqual(around.jumps!.library);
  });

  it('states the rule of a regular branch in plain words, citing no file', async () => {
    const negated = referenceTarget('negated@1', (op, _args, v) => (op === 'mul' ? [-v[0], -v[1]] : v));
    const r = await evaluateSuite(loadDemoSuite('sqrt-z2-minus-1-finite-cut'), negated, { cache });
    const f = findings(r).find((x) => x.outcome.kind === 'fail')!;
    expect(f.rule).toMatch(
      /^the regular branch of \(z\^2 - 1\)\^\(1\/2\) with k = 0 at z0 = 2(\.0)? \+ 0i, continued from z0 to z along a path that crosses none of the suite's cuts/,
    );
    expect(f.rule).not.toMatch(/\.md|§|DESIGN/);
  });

  it('evaluates a list of points once each and looks for no jumps or monodromy on it', async () => {
    // ISO/IEC 9899:2011 G.6.4.2: csqrt(−4 + 0i) = +0 + 2i and csqrt(−4 − 0i) = +0 − 2i; the two
    // values are far apart, but nothing lies between two listed points, so that is no jump.
    const suite = makeSuite({
      subject: 'sqrt(z)',
      paths: [
        {
          kind: 'points',
          name: 'both zeros at -4',
          points: [
            { re: '-4', im: '0' },
            { re: '-4', im: '-0' },
            { re: '-1', im: '-0' },
          ],
        },
      ],
    });
    let calls = 0;
    const counting = referenceTarget('counting@1', (_op, _args, v) => {
      calls++;
      return v;
    });
    const r = await evaluateSuite(suite, counting, { cache });
    const path = r.paths[0]!;
    expect({ kind: path.kind, points: path.points, counts: path.counts, calls }).toEqual({
      kind: 'points',
      points: 3,
      counts: { pass: 3, fail: 0, error: 0, skipped: 0, notApplicable: 0 },
      calls: 3,
    });
    expect(path.jumps).toBeNull();
    expect(path.monodromy).toBeNull();
  });

  it('states what was checked', async () => {
    const r = await evaluateSuite(loadDemoSuite('sqrt-principal-sz'), referenceTarget(), { cache });
    expect(r.checked).toEqual({
      convention: 'signed-zero',
      branch: 'principal branch of every function, signed-zero',
      tolerance: '4 ulps per part or relative error 8.881784197001252e-16 (4 eps)',
      paths: 3,
      points: 154,
      entry: 'complex',
      properties: {
        listed: ['conjugate-symmetry', 'root-power', 'range'],
        run: false,
        note: 'property checks are not run by evaluateSuite',
      },
    });
  });
});
