import type { SuiteTargetResult } from '../../../../shared/run-result';
import { evaluateSuite } from '../../../../harness/runner/evaluation/evaluate-suite';
import { BigComplex } from '../../../../harness/reference/complex/big-complex';
import { reciprocalAtZeroChoice } from '../../../../harness/reference/functions/reciprocal-at-zero-choice';
import { seededReferenceCache } from '../../../setup/seeded-reference-cache';
import { makeSuite } from '../../runner/support/make-suite';
import { referenceTarget } from '../../runner/support/reference-target';
import { suiteSegment } from '../../runner/support/suite-segment';

const cache = seededReferenceCache();
const findings = (r: SuiteTargetResult) => r.paths.flatMap((p) => p.findings);
// mpmath 1.3 (Debian's), checked on 5 December 2026: acoth(0) = iπ/2 and acot(0) = π/2 whatever
// the zero signs; this library answers as mpmath does at 0 and as the reference elsewhere.
const likeMpmath = referenceTarget('like-mpmath@1', (op, [z], v) =>
  z![0] === 0 && z![1] === 0 ? (op === 'acoth' ? [0, Math.PI / 2] : op === 'acot' ? [Math.PI / 2, 0] : v) : v,
);
const fromZero = suiteSegment('from 0', ['0', '0'], ['0.5', '0'], 2);

describe('reciprocalAtZeroChoice', () => {
  it('names the rule for each reciprocal function at a zero of either sign, and nothing elsewhere or for other functions', () => {
    for (const fn of ['acsc', 'asec', 'acot', 'acsch', 'asech', 'acoth'])
      for (const [re, im] of [
        [0, 0],
        [-0, 0],
        [0, -0],
        [-0, -0],
      ] as const) {
        const rule = reciprocalAtZeroChoice(fn, BigComplex.fromDoubles(re, im));
        expect(rule).toContain('a choice');
        expect(rule).toContain(`${fn} z = `);
        expect(rule).toContain('copysign(∞, x) + i·copysign(∞, −y)');
      }
    expect(reciprocalAtZeroChoice('acoth', BigComplex.fromDoubles(5e-324, 0))).toBeNull();
    expect(reciprocalAtZeroChoice('atanh', BigComplex.fromDoubles(0, 0))).toBeNull();
    expect(reciprocalAtZeroChoice('log', BigComplex.fromDoubles(0, 0))).toBeNull();
  });

  it('labels a failure at acoth(0) as resting on a choice, with its rule, and not the failure at 0.5', async () => {
    // The reference pushes 1/z through IEEE arithmetic: acoth(+0 + 0i) = atanh(∞ − i∞) = +0 − iπ/2
    // (ISO/IEC 9899:2011 G.6.2.3 for catanh(+∞ + i∞), conjugated); mpmath says +iπ/2.
    const r = await evaluateSuite(makeSuite({ subject: 'acoth(z)', paths: [fromZero] }), likeMpmath, { cache });
    const atZero = findings(r).find((f) => f.z.re === '0')!;
    expect(atZero.expected).toEqual({ re: '0', im: '-1.5707963267948966' });
    expect(atZero.choice).toContain('acoth z = atanh(1/z) is defined for z ≠ 0 only');
    expect(findings(r).filter((f) => f.z.re !== '0')).toEqual([]);
  });

  it('labels the choice inside a composed subject, where a step calls a reciprocal function at 0', async () => {
    const shifted = suiteSegment('from 1', ['1', '0'], ['1.5', '0'], 2);
    const r = await evaluateSuite(makeSuite({ subject: 'acot(z - 1)', paths: [shifted] }), likeMpmath, { cache });
    const atOne = findings(r).find((f) => f.z.re === '1')!;
    expect(atOne.choice).toContain('acot z = atan(1/z)');
    expect(atOne.steps?.map((s) => s.text)).toEqual(['z - 1', 'acot(z - 1)']);
  });
});
