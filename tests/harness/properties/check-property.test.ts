import type { PropertyOutcome } from '../../../shared/property-outcome';
import type { Convention } from '../../../shared/schemas/convention-schema';
import { propertyCheckSchema, type PropertyCheck } from '../../../shared/schemas/property-check-schema';
import type { ComplexPair } from '../../../harness/adapters/complex-pair';
import type { Target } from '../../../harness/adapters/target';
import { subjectCuts } from '../../../harness/cuts/subject-cuts';
import { parseSubject } from '../../../harness/expressions/parse-subject';
import { checkProperty } from '../../../harness/properties/check-property';
import { parseDouble } from '../../../harness/reference/numbers/parse-double';
import { referenceTarget } from '../support/reference-target';

const check = (input: Record<string, unknown>): PropertyCheck => propertyCheckSchema.parse(input);
const NEAR_CUTS = { kind: 'near-cuts', distance: '1e-6' };
const DISC = { kind: 'disc', center: { re: '0', im: '0' }, radius: '4' };
const discAround = (re: string, im: string, radius: string) => ({ kind: 'disc', center: { re, im }, radius });

async function run(
  subject: string,
  convention: Convention,
  input: Record<string, unknown>,
  target: Target,
): Promise<PropertyOutcome> {
  const expr = parseSubject(subject);
  return checkProperty(
    check(input),
    { text: subject, expr, cuts: subjectCuts(expr, { kind: 'principal' }), convention, tolerance: { ulps: 16 } },
    target,
  );
}

/** The reference's own values hold the law under both conventions (its failure message is the whole outcome: title, seed, path). */
async function expectHeldOnTheReference(subject: string, input: Record<string, unknown>): Promise<void> {
  for (const convention of ['signed-zero', 'counter-clockwise'] as const) {
    expect(await run(subject, convention, input, referenceTarget(convention))).toMatchObject({
      kind: 'held',
      title: expect.stringContaining(convention),
    });
  }
}

/** The outcome as a failure message: title (law and seed), fast-check path and counterexample. */
const explain = (o: PropertyOutcome): string => JSON.stringify(o, null, 1);
const point = (o: PropertyOutcome, i = 0): ComplexPair => {
  if (o.kind !== 'failed') throw new Error(`expected a failure, got ${explain(o)}`);
  const z = o.counterexample[i]!;
  return [parseDouble(z.re), parseDouble(z.im)];
};
const isNegativeZero = (x: number) => Object.is(x, -0);

// Mutants: each is a deliberately wrong function a library could plausibly ship.
/** Ignores the sign of a zero imaginary part, as a library without signed-zero support does. */
const ignoreZeroSigns =
  (op: string) =>
  ([z]: ComplexPair[], ref: (op: string, args: ComplexPair[]) => ComplexPair) =>
    ref(op, [[z![0] === 0 ? 0 : z![0], z![1] === 0 ? 0 : z![1]]]);
/** The argument from atan(y/x) instead of atan2(y, x): wrong by π in the left half-plane. */
const naiveArg = ([x, y]: ComplexPair) => Math.atan(y / x);
const naiveSqrt = ([z]: ComplexPair[]): ComplexPair => {
  const r = Math.sqrt(Math.hypot(...z!));
  const t = naiveArg(z!) / 2;
  return [r * Math.cos(t), r * Math.sin(t)];
};
const naiveLog = ([z]: ComplexPair[]): ComplexPair => [Math.log(Math.hypot(...z!)), naiveArg(z!)];
/** A logarithm on the branch 0 ≤ Im < 2π: a valid logarithm, not the principal one. */
const logFromZeroToTwoPi = ([z]: ComplexPair[], ref: (op: string, args: ComplexPair[]) => ComplexPair): ComplexPair => {
  const [re, im] = ref('log', [z!]);
  return [re, im < 0 ? im + 2 * Math.PI : im];
};

describe('checkProperty', () => {
  describe('conjugate-symmetry: f(conj z) = conj f(z)', () => {
    // ISO/IEC 9899:2011 G.6.4.2 (csqrt(conj(z)) = conj(csqrt(z))): conjugate symmetry, zero signs included, under Annex G.
    it('holds for the reference sqrt near its cut under signed-zero, seed 1330520191', async () => {
      const o = await run(
        'sqrt(z)',
        'signed-zero',
        { law: 'conjugate-symmetry', region: NEAR_CUTS, runs: 300, seed: 1330520191 },
        referenceTarget('signed-zero'),
      );
      expect(o).toMatchObject({ kind: 'held' });
      expect(o.title).toContain('f(conj z) = conj f(z)');
      expect(o.title).toContain('seed 1330520191');
      // The title says what the law allows and with which t, so a reader of any output can judge a verdict.
      expect(o.title).toContain(
        "t = 16 ulps (3.55e-15) per library value, allowing |left - right| <= 2t(|f(z)| + |z f'(z)|)",
      );
    });

    it('fails for a sqrt that ignores zero signs under signed-zero, shrinking to a point on the cut, seed 1330520191', async () => {
      const mutant = referenceTarget('signed-zero', { sqrt: ignoreZeroSigns('sqrt') }, 'mutant/ignores-zero-signs');
      const o = await run(
        'sqrt(z)',
        'signed-zero',
        { law: 'conjugate-symmetry', region: NEAR_CUTS, runs: 300, seed: 1330520191 },
        mutant,
      );
      const [re, im] = point(o);
      // The mutant differs from Annex G only where a zero imaginary part meets the cut (−∞, 0].
      expect(re < 0 && im === 0).toBe(true);
      expect(o.kind === 'failed' && o.path.length > 0 && o.seed === 1330520191).toBe(true);
      expect(o.kind === 'failed' && o.values.map((v) => v.name)).toEqual(['f(conj z)', 'conj f(z)']);
      expect(o.kind === 'failed' && o.sides).toEqual(['f(conj z)', 'conj f(z)']);
    });

    it('holds for a sqrt that ignores zero signs under counter-clockwise, where the law says nothing on the cut, seed 1573653495', async () => {
      // Kahan 1987: zero signs carry no meaning; points with a zero part are excluded, and the rest are off the cut.
      const mutant = referenceTarget('signed-zero', { sqrt: ignoreZeroSigns('sqrt') });
      const o = await run(
        'sqrt(z)',
        'counter-clockwise',
        { law: 'conjugate-symmetry', region: NEAR_CUTS, runs: 300, seed: 1573653495 },
        mutant,
      );
      expect(o).toMatchObject({ kind: 'held' });
      expect(o.kind === 'held' && o.excluded).toBeGreaterThan(0);
    });

    // Measured on complex.js 2.4.3: acos(−1.000000000000005 ± 5e−324i) has imaginary parts 1.0106459225e−7 and
    // 1.0106459236e−7 beside a real part π, 8,388,607 ulps apart in that part and 3.5e−17 of |f|.
    it('holds for an acos off by a quarter ulp of |f| in a tiny imaginary part on one side of the cut, seed 1595614399', async () => {
      const quarterUlpUp = referenceTarget('counter-clockwise', {
        acos: ([z], ref) => {
          const [re, im] = ref('acos', [z!]);
          return z![1] > 0 ? [re, im + 2 ** -54 * Math.hypot(re, im)] : [re, im];
        },
      });
      const o = await run(
        'acos(z)',
        'counter-clockwise',
        { law: 'conjugate-symmetry', region: NEAR_CUTS, runs: 300, seed: 1595614399 },
        quarterUlpUp,
      );
      expect({ kind: o.kind, reason: 'reason' in o ? o.reason : '' }).toEqual({ kind: 'held', reason: '' });
    });

    // Backward error: f at z(1 + 2^−50) is what a library 4 ulps off in its input gives; next to the branch
    // point i, |z·f′(z)|/|f| = |z|/(|1 + z²|·|atan z|) reaches 1e11 (DLMF 4.24.3: d/dz arctan z = 1/(1 + z²)).
    it('holds for an atan evaluated 4 ulps away from z above the real axis, next to its branch point i, seed 1330520191', async () => {
      const perturbed = referenceTarget('counter-clockwise', {
        atan: ([z], ref) =>
          z![1] > 0 ? ref('atan', [[z![0] * (1 + 2 ** -50), z![1] * (1 + 2 ** -50)]]) : ref('atan', [z!]),
      });
      const o = await run(
        'atan(z)',
        'counter-clockwise',
        { law: 'conjugate-symmetry', region: discAround('0', '1', '1e-9'), runs: 300, seed: 1330520191 },
        perturbed,
      );
      expect({ kind: o.kind, reason: 'reason' in o ? o.reason : '' }).toEqual({ kind: 'held', reason: '' });
    });

    // DLMF 4.23(ii): acos is continuous off its cuts and real on (−1, 1), so just above (−∞, −1) its imaginary
    // part is negative, below positive. Within t/2 of the branch point −1 (t = 16·2^−52) a flipped imaginary part is
    // smaller than the sensitivity allowance 2t·|z·f′(z)|; only the rule that parts may not change sign sees it.
    it('fails for an acos on the wrong side of its cut within 1.5e-15 of the branch point -1, seed 20261205', async () => {
      const wrongSide = referenceTarget('counter-clockwise', {
        acos: ([z], ref) => {
          const [re, im] = ref('acos', [z!]);
          return z![0] < -1 && z![1] > 0 ? [re, -im] : [re, im];
        },
      });
      const o = await run(
        'acos(z)',
        'counter-clockwise',
        { law: 'conjugate-symmetry', region: discAround('-1', '0', '1.5e-15'), runs: 40, seed: 20261205 },
        wrongSide,
      );
      const [re] = point(o);
      expect(re).toBeLessThan(-1);
      expect(o).toMatchObject({
        kind: 'failed',
        reason: expect.stringContaining('im parts of the sides have opposite signs'),
      });
    });

    it('is not checked for a subject with a non-real constant, since (conj z)^w = conj(z^conj(w))', async () => {
      const o = await run(
        'pow(z, 0.5 + 2i)',
        'signed-zero',
        { law: 'conjugate-symmetry', region: NEAR_CUTS, runs: 10, seed: 1 },
        referenceTarget('signed-zero'),
      );
      expect(o).toMatchObject({ kind: 'not-checked', reason: expect.stringContaining('non-real constant') });
    });
  });

  describe('odd-symmetry: f(-z) = -f(z)', () => {
    // DLMF §4.23(iii) (arcsin is odd; the equation number 4.23.10 not checked); Annex G casin is odd (G.6.2.2 via casinh).
    it('holds for the reference asin in a disc under both conventions, seed 735059753', async () => {
      await expectHeldOnTheReference('asin(z)', { law: 'odd-symmetry', region: DISC, runs: 300, seed: 735059753 });
    });

    it('fails for an asin that returns pi - asin(z) in the left half-plane (another value of arcsin), seed 735059753', async () => {
      const mutant = referenceTarget('signed-zero', {
        asin: ([z], ref) => {
          const [re, im] = ref('asin', [z!]);
          return z![0] < 0 ? [Math.PI - re, -im] : [re, im];
        },
      });
      const o = await run(
        'asin(z)',
        'signed-zero',
        { law: 'odd-symmetry', region: DISC, runs: 300, seed: 735059753 },
        mutant,
      );
      expect(o).toMatchObject({ kind: 'failed' });
    });
  });

  describe('even-symmetry: f(-z) = f(z)', () => {
    it('holds for sqrt(z^2 - 1) on the reference under signed-zero, seed 20261201', async () => {
      const o = await run(
        'sqrt(z^2 - 1)',
        'signed-zero',
        { law: 'even-symmetry', region: DISC, runs: 200, seed: 20261201 },
        referenceTarget('signed-zero'),
      );
      expect(o).toMatchObject({ kind: 'held' });
    });

    it('fails when the library squares z as z*|z|, seed 20261201', async () => {
      const mutant = referenceTarget('signed-zero', {
        pow: ([z, w], ref) =>
          w![0] === 2 && w![1] === 0 ? [z![0] * Math.hypot(...z!), z![1] * Math.hypot(...z!)] : ref('pow', [z!, w!]),
      });
      const o = await run(
        'sqrt(z^2 - 1)',
        'signed-zero',
        { law: 'even-symmetry', region: DISC, runs: 200, seed: 20261201 },
        mutant,
      );
      expect(o).toMatchObject({ kind: 'failed' });
    });
  });

  describe('root-power: f(z)^n = g(z)', () => {
    // Definition of the n-th root (DLMF §4.2(iv)): every root raised to n returns g.
    it('holds for the reference sqrt, cbrt, nthroot(z, 5) and pow(z, 1/3) in a disc, seed 2136471502', async () => {
      for (const [subject, power] of [
        ['sqrt(z)', 2],
        ['cbrt(z)', 3],
        ['nthroot(z, 5)', 5],
        ['pow(z, 1/3)', 3],
      ] as const) {
        const o = await run(
          subject,
          'signed-zero',
          { law: 'root-power', power, region: DISC, runs: 200, seed: 2136471502 },
          referenceTarget('signed-zero'),
        );
        expect({ subject, outcome: o.kind }).toEqual({ subject, outcome: 'held' });
      }
    });

    it('fails for a sqrt whose half-angle comes from atan(y/x), with a counterexample in the left half-plane, seed 2136471502', async () => {
      const o = await run(
        'sqrt(z)',
        'signed-zero',
        { law: 'root-power', power: 2, region: DISC, runs: 300, seed: 2136471502 },
        referenceTarget('signed-zero', { sqrt: naiveSqrt }),
      );
      // atan(y/x) and atan2(y, x) differ by ±π exactly when x < 0; then the "root" squares to −z.
      expect(point(o)[0]).toBeLessThan(0);
    });

    it('is not checked when the power does not match the root', async () => {
      const o = await run(
        'sqrt(z)',
        'signed-zero',
        { law: 'root-power', power: 3, region: DISC, runs: 10, seed: 1 },
        referenceTarget('signed-zero'),
      );
      expect(o).toMatchObject({ kind: 'not-checked', reason: expect.stringContaining('degree 2') });
    });
  });

  describe('exp-log: exp(log z) = z', () => {
    it('holds for the reference log in a disc under both conventions, seed 849994939', async () => {
      await expectHeldOnTheReference('log(z)', { law: 'exp-log', region: DISC, runs: 300, seed: 849994939 });
    });

    it('fails for a log whose imaginary part is atan(y/x), with a counterexample in the left half-plane, seed 849994939', async () => {
      const o = await run(
        'log(z)',
        'signed-zero',
        { law: 'exp-log', region: DISC, runs: 300, seed: 849994939 },
        referenceTarget('signed-zero', { log: naiveLog }),
      );
      expect(point(o)[0]).toBeLessThan(0);
    });
  });

  describe('range: f(z) in the principal range of f', () => {
    // DLMF 4.2.5 and 4.2.7: −π ≤ Im Log z ≤ π; half-open (−π, π] under Kahan's rule.
    it('holds for the reference log near its cut under both conventions, seed 531763507', async () => {
      await expectHeldOnTheReference('log(z)', { law: 'range', region: NEAR_CUTS, runs: 300, seed: 531763507 });
    });

    it('fails for a log on the branch 0 <= Im < 2pi, with a counterexample below the real axis, seed 531763507', async () => {
      const o = await run(
        'log(z)',
        'signed-zero',
        { law: 'range', region: NEAR_CUTS, runs: 300, seed: 531763507 },
        referenceTarget('signed-zero', { log: logFromZeroToTwoPi }),
      );
      const [, im] = point(o);
      expect(im < 0 || isNegativeZero(im)).toBe(true);
    });

    it('fails under counter-clockwise for an Annex G log, at a point on the cut with a -0 imaginary part, seed 531763507', async () => {
      // Annex G gives Log(x − 0i) = ln|x| − iπ; Kahan's rule leaves −π out of the range on the cut.
      const o = await run(
        'log(z)',
        'counter-clockwise',
        { law: 'range', region: NEAR_CUTS, runs: 300, seed: 531763507 },
        referenceTarget('signed-zero'),
      );
      const [re, im] = point(o);
      expect(re < 0 && isNegativeZero(im)).toBe(true);
    });
  });

  describe('unwinding: log(z1*z2) = log z1 + log z2 - 2*pi*i*K(log z1 + log z2)', () => {
    // Corless & Jeffrey 1996 (the paper was not read): K(w) = ceil((Im w − π) / 2π).
    it('holds for the reference log near its cut under both conventions, seed 77001', async () => {
      await expectHeldOnTheReference('log(z)', { law: 'unwinding', region: NEAR_CUTS, runs: 300, seed: 77001 });
    });

    it('holds for the reference log in a disc, seed 77002', async () => {
      const o = await run(
        'log(z)',
        'signed-zero',
        { law: 'unwinding', region: DISC, runs: 300, seed: 77002 },
        referenceTarget('signed-zero'),
      );
      expect(o).toMatchObject({ kind: 'held' });
    });

    it('fails for a log on the branch 0 <= Im < 2pi and keeps both points of the shrunk counterexample, seed 77002', async () => {
      const o = await run(
        'log(z)',
        'signed-zero',
        { law: 'unwinding', region: DISC, runs: 300, seed: 77002 },
        referenceTarget('signed-zero', { log: logFromZeroToTwoPi }),
      );
      expect(o.kind === 'failed' && o.counterexample).toHaveLength(2);
    });
  });

  describe('seeds and replay', () => {
    it('gives the same shrunk counterexample and path for the same pinned seed', async () => {
      const mutant = referenceTarget('signed-zero', { log: naiveLog });
      const input = { law: 'exp-log', region: DISC, runs: 300, seed: 4242 };
      const [a, b] = [
        await run('log(z)', 'signed-zero', input, mutant),
        await run('log(z)', 'signed-zero', input, mutant),
      ];
      expect(a.kind).toBe('failed');
      expect(b).toEqual(a);
    });

    it('says a law does not apply rather than passing it', async () => {
      const o = await run(
        'sqrt(z)',
        'signed-zero',
        { law: 'exp-log', region: DISC, runs: 10, seed: 1 },
        referenceTarget('signed-zero'),
      );
      expect(o.kind).toBe('not-checked');
    });

    it('says near-cuts cannot be sampled for a principal subject whose cuts are preimages', async () => {
      const o = await run(
        'sqrt(z^2 - 1)',
        'signed-zero',
        { law: 'conjugate-symmetry', region: NEAR_CUTS, runs: 10, seed: 1 },
        referenceTarget('signed-zero'),
      );
      expect(o).toMatchObject({ kind: 'not-checked', reason: expect.stringContaining('not known') });
    });

    it('records a target that throws as a failure with the thrown message, shrunk like any other, seed 5', async () => {
      const throwing: Target = {
        ...referenceTarget('signed-zero'),
        evaluate: async () => Promise.reject(new Error('adapter crashed')),
      };
      const o = await run('sqrt(z)', 'signed-zero', { law: 'range', region: DISC, runs: 20, seed: 5 }, throwing);
      expect(o).toMatchObject({ kind: 'failed', reason: 'the check threw: adapter crashed', seed: 5 });
    });

    it('says which operation a target lacks', async () => {
      const lacking: Target = {
        ...referenceTarget('signed-zero'),
        name: 'no-cbrt',
        supports: async (op) => op !== 'cbrt',
      };
      const o = await run('cbrt(z)', 'signed-zero', { law: 'range', region: DISC, runs: 10, seed: 1 }, lacking);
      expect(o).toMatchObject({ kind: 'not-checked', reason: 'no-cbrt has no cbrt' });
    });
  });
});
