import type { ConventionFingerprint } from '../../../shared/convention-fingerprint';
import type { ComplexPair } from '../../../harness/adapters/complex-pair';
import { discoverTargets } from '../../../harness/adapters/discover-targets';
import { FINGERPRINT_FUNCTIONS } from '../../../harness/fingerprint/fingerprint-functions';
import { fingerprintTarget } from '../../../harness/fingerprint/fingerprint-target';
import { referenceCall } from '../support/reference-call';
import { referenceTarget } from '../support/reference-target';

const only = (...labels: string[]) => FINGERPRINT_FUNCTIONS.filter((f) => labels.includes(f.label));
const rows = (fp: ConventionFingerprint) => fp.cuts.map((c) => `${c.function} ${c.cut}: ${c.behaviour}`);
/** A sqrt or log that treats −0 as +0, as a library without signed zeros does. */
const ignoringZeroSigns =
  (op: string) =>
  ([z]: ComplexPair[], ref: (op: string, args: ComplexPair[]) => ComplexPair) =>
    ref(op, [[z![0] || 0, z![1] || 0]]);

describe('fingerprintTarget', () => {
  it('builds values through the constructor by default, so complex.js 2.4.1 is not certified signed-zero on log where its constructor drops −0', async () => {
    const open = (name: string) =>
      discoverTargets()
        .find((d) => d.name === name)!
        .open();
    const [old, fixed] = [open('complex.js@2.4.1'), open('complex.js@2.4.2')];
    const before = await fingerprintTarget(old, only('log'));
    const after = await fingerprintTarget(fixed, only('log'));
    expect(before.entry).toBe('complex');
    expect(before.statement).toContain('built through the complex entry (new Complex(re, im))');
    // 2.4.2's log honours −0 on its cut (G.6.3.2); 2.4.1's constructor makes −0 into +0 first, so both
    // zero signs land above the cut, the side Kahan's counter-clockwise rule keeps.
    expect(rows(after)).toEqual(['log (-inf, 0]: signed-zero']);
    expect(rows(before)).toEqual(['log (-inf, 0]: counter-clockwise']);
    // Through another entry when asked: complex.js's string form loses −0 in 2.4.2 too.
    const viaString = await fingerprintTarget(fixed, only('log'), 'string');
    expect(viaString.entry).toBe('string');
    expect(rows(viaString)).toEqual(['log (-inf, 0]: counter-clockwise']);
    await expect(fingerprintTarget(fixed, only('log'), 'parser')).rejects.toThrow(
      'complex.js@2.4.2 has no entry "parser"; its entries are complex, object, array, string',
    );
  });

  it("classifies Python's cmath as signed-zero on every cut of every function it has", async () => {
    // Python documents that cmath follows C99 Annex G for branch cuts and signed zeros (common practice).
    const descriptor = discoverTargets().find((d) => d.library === 'cmath');
    if (!descriptor) throw new Error('Debian python3 at /usr/bin/python3 runs the cmath target');
    const target = descriptor.open();
    try {
      const fp = await fingerprintTarget(target);
      expect(fp.cuts.length).toBeGreaterThanOrEqual(15);
      expect(fp.cuts.filter((c) => c.behaviour !== 'signed-zero')).toEqual([]);
      expect(fp.missing).toEqual(expect.arrayContaining(['cbrt', 'acot']));
    } finally {
      await target.close();
    }
  }, 20_000);

  it('classifies the reference under each convention as that convention on every cut, reciprocal functions included', async () => {
    for (const convention of ['signed-zero', 'counter-clockwise'] as const) {
      const fp = await fingerprintTarget(referenceTarget(convention));
      expect(fp.cuts).toHaveLength(FINGERPRINT_FUNCTIONS.flatMap((f) => f.cuts).length);
      expect(fp.cuts.filter((c) => c.behaviour !== convention).map((c) => `${c.function} ${c.cut}`)).toEqual([]);
    }
  }, 20_000);

  it('classifies a sqrt and a log that ignore zero signs as counter-clockwise on (-inf, 0]', async () => {
    // Kahan 1987: the negative real axis belongs to the upper side, which is where +0 puts it.
    const mutant = referenceTarget(
      'signed-zero',
      { sqrt: ignoringZeroSigns('sqrt'), log: ignoringZeroSigns('log') },
      'mutant/ignores-zero-signs',
    );
    const fp = await fingerprintTarget(mutant, only('sqrt', 'log'));
    expect(rows(fp)).toEqual(['sqrt (-inf, 0]: counter-clockwise', 'log (-inf, 0]: counter-clockwise']);
  });

  it("calls an asin that ignores zero signs neither on [1, +inf), where Kahan's rule closes the cut from below", async () => {
    // Kahan 1987: turning counter-clockwise about 1 reaches [1, ∞) from below; +0 picks the upper side instead.
    const mutant = referenceTarget('signed-zero', { asin: ignoringZeroSigns('asin') });
    const fp = await fingerprintTarget(mutant, only('asin'));
    expect(rows(fp)).toEqual(['asin (-inf, -1]: counter-clockwise', 'asin [1, +inf): neither']);
    expect(fp.cuts[1]!.probes[0]!.note).toContain('leaves open');
  });

  it('marks sqrt, pow(z, 1/2) and log inconsistent when only sqrt ignores zero signs on their shared cut', async () => {
    const mutant = referenceTarget('signed-zero', { sqrt: ignoringZeroSigns('sqrt') });
    const fp = await fingerprintTarget(mutant, only('sqrt', 'pow(z, 1/2)', 'log'));
    expect(fp.cuts.map((c) => [c.function, c.behaviour, c.alone, c.disagreesWith])).toEqual([
      ['sqrt', 'inconsistent', 'counter-clockwise', ['pow(z, 1/2)', 'log']],
      ['pow(z, 1/2)', 'inconsistent', 'signed-zero', ['sqrt']],
      ['log', 'inconsistent', 'signed-zero', ['sqrt']],
    ]);
  });

  it('carries, for each function it disagrees with, a point where the two part ways with both values and both references', async () => {
    // ISO/IEC 9899:2011 G.6.4.2: csqrt(−0.5 − 0i) = +0 − i√0.5; Kahan's counter-clockwise rule closes
    // (−∞, 0] from above, so there the value is +i√0.5 whatever the zero's sign. G.6.3.2:
    // clog(−0.5 − 0i) = ln 0.5 − iπ, and the counter-clockwise log there is ln 0.5 + iπ.
    const mutant = referenceTarget('signed-zero', { sqrt: ignoringZeroSigns('sqrt') });
    const fp = await fingerprintTarget(mutant, only('sqrt', 'log'));
    const r = Math.sqrt(0.5).toString();
    const ln = Math.log(0.5).toString();
    const pi = Math.PI.toString();
    expect(fp.cuts[0]!.disagreements).toEqual([
      {
        with: 'log',
        at: { re: '-0.5', im: '0' },
        sides: [
          {
            function: 'sqrt',
            at: { re: '-0.5', im: '-0' },
            value: { re: '0', im: r },
            reference: { 'signed-zero': { re: '0', im: `-${r}` }, 'counter-clockwise': { re: '0', im: r } },
            follows: 'counter-clockwise',
          },
          {
            function: 'log',
            at: { re: '-0.5', im: '-0' },
            value: { re: ln, im: `-${pi}` },
            reference: { 'signed-zero': { re: ln, im: `-${pi}` }, 'counter-clockwise': { re: ln, im: pi } },
            follows: 'signed-zero',
          },
        ],
      },
    ]);
    expect(fp.cuts[1]!.disagreements?.[0]?.with).toBe('sqrt');
  });

  it('shows each function at the zero sign where its own conventions differ, which is not the same side for every function on a cut', async () => {
    // Kahan's rule closes (−∞, 0] from above for log (clog(−0.5 − 0i) = ln 0.5 − iπ is where Annex G
    // departs from it) and from below for asech, so each side is shown at its own zero sign.
    const mutant = referenceTarget('signed-zero', {
      asech: (args) => referenceCall('asech', args, 'counter-clockwise'),
    });
    const fp = await fingerprintTarget(mutant, only('log', 'asech'));
    const [mine, theirs] = fp.cuts.find((c) => c.function === 'asech')!.disagreements![0]!.sides;
    expect([mine.function, mine.at, mine.follows]).toEqual(['asech', { re: '-0.5', im: '0' }, 'counter-clockwise']);
    expect([theirs.function, theirs.at, theirs.follows]).toEqual(['log', { re: '-0.5', im: '-0' }, 'signed-zero']);
  });

  it('calls a log that reads the zero sign backwards neither, saying the sides are swapped', async () => {
    // Annex G (ISO/IEC 9899:2011 G.6.3.2): clog(−1 + 0i) = iπ and clog(−1 − 0i) = −iπ; this mutant gives them the other way round.
    const mutant = referenceTarget('signed-zero', {
      log: ([z], ref) => ref('log', [[z![0], z![1] === 0 ? (Object.is(z![1], -0) ? 0 : -0) : z![1]]]),
    });
    const fp = await fingerprintTarget(mutant, only('log'));
    expect(rows(fp)).toEqual(['log (-inf, 0]: neither']);
    expect(fp.cuts[0]!.probes.every((p) => p.note === '+0 and -0 give the sides the other way round')).toBe(true);
  });

  it('calls a square root cut along the positive real axis neither on (-inf, 0], saying the cut is not there', async () => {
    // i·√(−z) squares to z, but its cut is [0, ∞): just below −4 it gives 2i where the principal root is −2i.
    const mutant = referenceTarget('signed-zero', {
      sqrt: ([z], ref) => {
        const [re, im] = ref('sqrt', [[-z![0], -z![1]]]);
        return [-im, re];
      },
    });
    const fp = await fingerprintTarget(mutant, only('sqrt'));
    expect(rows(fp)).toEqual(['sqrt (-inf, 0]: neither']);
    expect(fp.cuts[0]!.probes.every((p) => p.note?.includes('just off the cut'))).toBe(true);
    // The point is written with one sign per part, "-4 - 1e-9i", never "-4 -1e-9i".
    for (const p of fp.cuts[0]!.probes) expect(p.note).toMatch(/^just off the cut, at -[0-9.e-]+ [+-] [0-9.e-]+i, /);
  });

  it("finds complex.js 2.4.3's sqrt counter-clockwise but its log and pow(z, 1/2) signed-zero on (-inf, 0]", async () => {
    // ISO/IEC 9899:2011 G.6.4.2: csqrt(−4 − 0i) = 0 − 2i; complex.js gives 0 + 2i (measured), while its log keeps Im = −π.
    const descriptor = discoverTargets().find((d) => d.name === 'complex.js@2.4.3');
    if (!descriptor) throw new Error('complex.js 2.4.3 is a dependency of the project');
    const fp = await fingerprintTarget(descriptor.open(), only('sqrt', 'pow(z, 1/2)', 'log'));
    expect(fp.cuts.map((c) => `${c.function}: ${c.alone}`)).toEqual([
      'sqrt: counter-clockwise',
      'pow(z, 1/2): signed-zero',
      'log: signed-zero',
    ]);
    expect(fp.statement).toContain('not a certification');
  });
});
