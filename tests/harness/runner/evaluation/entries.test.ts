import { complexJsTarget } from '../../../../harness/adapters/complex-js-target';
import { jsMathTarget } from '../../../../harness/adapters/js-math-target';
import { mathjsTarget } from '../../../../harness/adapters/mathjs-target';
import { evaluateSuite } from '../../../../harness/runner/evaluation/evaluate-suite';
import type { PointFinding, SuiteTargetResult } from '../../../../shared/run-result';
import { seededReferenceCache } from '../../../setup/seeded-reference-cache';
import { makeSuite } from '../support/make-suite';

const cache = seededReferenceCache();
const findings = (r: SuiteTargetResult): PointFinding[] => r.paths.flatMap((p) => p.findings);

describe('evaluateSuite with target entries', () => {
  it('makes the pair an error naming an entry the target does not offer and listing its entries', async () => {
    const suite = makeSuite({
      subject: 'sqrt(z)',
      entry: 'parser',
      paths: [{ kind: 'segment', name: 's', from: { re: '1', im: '0' }, to: { re: '4', im: '0' }, samples: 3 }],
    });
    const r = await evaluateSuite(suite, complexJsTarget('complex.js', '2.4.3'), { cache });
    expect(r.status).toBe('error');
    expect(r.errors).toEqual([
      'the suite cannot be evaluated: complex.js@2.4.3 has no entry "parser"; its entries are complex, object, array, string',
    ]);
    expect(r.counts.pass + r.counts.fail).toBe(0);
  });

  it('names the entry of a path that names its own, and refuses one the target lacks even on one path', async () => {
    const suite = makeSuite({
      subject: 'sqrt(z)',
      paths: [
        { kind: 'segment', name: 'a', from: { re: '1', im: '0' }, to: { re: '4', im: '0' }, samples: 3 },
        {
          kind: 'segment',
          name: 'b',
          entry: 'number',
          from: { re: '1', im: '0' },
          to: { re: '4', im: '0' },
          samples: 3,
        },
      ],
    });
    const r = await evaluateSuite(suite, complexJsTarget('complex.js', '2.4.3'), { cache });
    expect(r.status).toBe('error');
    expect(r.errors[0]).toContain('has no entry "number"');
    const ok = await evaluateSuite(suite, mathjsTarget('mathjs', '15.2.0', 'complex', false, '2.4.3'), { cache });
    expect(ok.checked.entry).toBe('complex');
    expect(ok.paths.map((p) => p.entry)).toEqual([undefined, 'number']);
    expect(ok.status).toBe('pass');
  });

  it('counts a −0 or nonzero imaginary part through a plain-number entry as not applicable, never a failure', async () => {
    const suite = makeSuite({
      subject: 'sqrt(z)',
      paths: [
        { kind: 'segment', name: 'below', from: { re: '-4', im: '-0' }, to: { re: '-1', im: '-0' }, samples: 4 },
        { kind: 'segment', name: 'off', from: { re: '-4', im: '1' }, to: { re: '-1', im: '1' }, samples: 3 },
        { kind: 'segment', name: 'positive', from: { re: '1', im: '0' }, to: { re: '4', im: '0' }, samples: 4 },
      ],
    });
    const r = await evaluateSuite(suite, jsMathTarget(), { cache });
    expect(r.counts).toEqual({ pass: 4, fail: 0, error: 0, skipped: 0, notApplicable: 7 });
    expect(r.paths[0]?.notApplicable).toEqual([
      { reason: 'the number entry (a plain number re) cannot carry the −0 of the imaginary part', count: 4 },
    ]);
    expect(r.paths[1]?.notApplicable).toEqual([
      { reason: 'the number entry (a plain number re) has no imaginary part', count: 3 },
    ]);
    expect(r.status).toBe('pass');
  });

  it('reads a −0 imaginary part through a plain-number entry as applicable under counter-clockwise continuity, where zero signs do not count', async () => {
    const suite = makeSuite({
      subject: 'exp(z)',
      convention: 'counter-clockwise',
      paths: [{ kind: 'segment', name: 'line', from: { re: '-1', im: '-0' }, to: { re: '1', im: '-0' }, samples: 3 }],
    });
    const r = await evaluateSuite(suite, jsMathTarget(), { cache });
    expect(r.counts.notApplicable).toBe(0);
    expect(r.counts.pass).toBe(3);
  });

  it('reports no zero-sign failure for the imaginary part of a real result through a plain-number entry', async () => {
    // acos(x + 0i) = acos(x) − 0i for −1 < x < 1 under signed zeros (ISO/IEC 9899:2011 G.6.1.1:
    // cacos(conj(z)) = conj(cacos(z)), and the value inside the cut-free interval has a −0
    // imaginary part; from memory, and the reference engine agrees). Math.acos returns a plain
    // number, which has no imaginary part to be wrong about.
    const suite = makeSuite({
      subject: 'acos(z)',
      paths: [
        { kind: 'segment', name: 'inside', from: { re: '-0.5', im: '0' }, to: { re: '0.5', im: '0' }, samples: 5 },
      ],
    });
    const r = await evaluateSuite(suite, jsMathTarget(), { cache });
    expect(findings(r).map((f) => f.outcome.kind === 'fail' && f.outcome.diagnosis.kind)).toEqual([]);
    expect(r.counts.pass).toBe(5);
    // The same values through complex.js's constructor carry the sign, and are checked on it.
    const complexJs = await evaluateSuite(suite, complexJsTarget('complex.js', '2.4.3'), { cache });
    expect(complexJs.counts.pass + complexJs.counts.fail).toBe(5);
  });

  it('counts a point on a real-axis cut through a plain-number entry as not applicable where only the input’s zero sign would pick the side', async () => {
    // acos(x + 0i) = 0 − i·acosh(x) for x > 1 under signed zeros, and + i·acosh(x) from below
    // (ISO/IEC 9899:2011 G.6.1.1 with cacos(conj z) = conj(cacos z); from memory, the reference agrees).
    // mathjs's acos of the plain number 1.5 answers +0.962…i: a side the number did not ask for, since
    // it has no zero imaginary part to ask with. Through math.complex(1.5, 0) the side is asked for.
    const suite = makeSuite({
      subject: 'acos(z)',
      paths: [
        { kind: 'segment', name: 'on the cut', from: { re: '1.5', im: '0' }, to: { re: '3', im: '0' }, samples: 4 },
      ],
    });
    const numberEntry = await evaluateSuite(suite, mathjsTarget('mathjs', '15.2.0', 'number', false, '2.4.3'), {
      cache,
    });
    expect(numberEntry.counts).toMatchObject({ fail: 0, notApplicable: 4 });
    expect(numberEntry.paths[0]?.notApplicable?.[0]?.reason).toBe(
      'the number entry (re as a plain number) cannot say which side of the cut the point is on: only the sign of its zero imaginary part picks the side',
    );
    expect(numberEntry.byDiagnosis).toEqual({});
    const complexEntry = await evaluateSuite(
      { ...suite, entry: 'complex' },
      mathjsTarget('mathjs', '15.2.0', 'number', false, '2.4.3'),
      { cache },
    );
    expect(complexEntry.counts.notApplicable).toBe(0);
    expect(complexEntry.counts.pass + complexEntry.counts.fail).toBe(4);
  });

  it('keeps a point’s other labels through a plain-number entry and drops only the zero sign it could not send', async () => {
    // mathjs's acsch(−0.001) is 104,212 ulps off in its real part (observed; the example):
    // that stays a finding, while the input's zero imaginary sign, which a number cannot carry, is no label.
    const suite = makeSuite({
      subject: 'acsch(z)',
      paths: [
        { kind: 'segment', name: 'near 0', at: ['0'], from: { re: '-0.001', im: '0' }, to: { re: '-1', im: '0' } },
      ],
    });
    const r = await evaluateSuite(suite, mathjsTarget('mathjs', '15.2.0', 'number', false, '2.4.3'), { cache });
    const f = findings(r)[0];
    const labels = f?.outcome.kind === 'fail' ? (f.outcome.labels ?? [f.outcome.diagnosis]) : [];
    expect(labels.map((l) => l.kind)).toEqual(['inaccurate']);
    expect(r.byDiagnosis).toEqual({ inaccurate: 1 });
  });

  it('passes a composed subject’s intermediate value to the next step as the library’s own object', async () => {
    // Watched on the prototype: the object sqrt returns is the very `this` of the mul that follows,
    // as in a user's `z.sqrt().mul(1)`; no step reads parts out and builds a new value.
    type Value = { re: number; im: number };
    const Complex = require('complex.js') as { prototype: Record<string, (...a: unknown[]) => Value> };
    const [sqrt, mul] = [Complex.prototype.sqrt!, Complex.prototype.mul!];
    const made: Value[] = [];
    const received: Value[] = [];
    Complex.prototype.sqrt = function (this: Value, ...a: unknown[]) {
      const v = sqrt.apply(this, a);
      made.push(v);
      return v;
    };
    Complex.prototype.mul = function (this: Value, ...a: unknown[]) {
      received.push(this);
      return mul.apply(this, a);
    };
    try {
      const suite = makeSuite({
        subject: 'sqrt(z) * 2',
        paths: [{ kind: 'segment', name: 's', from: { re: '-4', im: '-0' }, to: { re: '-1', im: '-0' }, samples: 3 }],
      });
      const r = await evaluateSuite(suite, complexJsTarget('complex.js', '2.4.3'), { cache });
      expect(r.counts.pass + r.counts.fail).toBe(3);
    } finally {
      Complex.prototype.sqrt = sqrt;
      Complex.prototype.mul = mul;
    }
    expect(received.length).toBe(3);
    expect(received.every((v, i) => v === made[i])).toBe(true);
  });
});
