import { answerReference } from '../../../harness/reference/answer-reference';
import { cpuMilliseconds } from '../../../scripts/reference-sweep/cpu-milliseconds';
import { formatDouble } from '../../../harness/reference/numbers/format-double';
import { askPython, type OraclePoint } from '../../external/python-oracle';
import { unhex } from '../../external/unhex';
import { FUNCTION_ARITY } from '../../../shared/function-arity';
import { compareWithMpmath } from '../../../scripts/reference-sweep/compare-with-mpmath';
import type { SweepInput } from '../../../scripts/reference-sweep/sweep-inputs';

describe('answerReference', () => {
  it.each(['sin', 'toString', 'constructor', '__proto__', 'hasOwnProperty'])(
    'answers "unknown function" for %s, a name outside the catalogue, even one every object inherits',
    (fn) => {
      expect(answerReference({ fn, z: { re: '1', im: '0' }, convention: 'signed-zero' })).toEqual({
        error: `unknown function "${fn}"`,
      });
    },
  );

  it('evaluates a catalogue function named in the request', () => {
    expect(answerReference({ fn: 'sqrt', z: { re: '-4', im: '-0' }, convention: 'signed-zero', digits: 5 })).toEqual({
      value: { re: '0', im: '-2' },
      double: { re: '0', im: '-2' },
    });
  });
});

const MAX = '1.7976931348623157e308';

/**
 * Milliseconds of CPU one answer takes, warm: the fastest of three runs after one that fills the
 * tables. CPU rather than the clock, which other work on the shared 2-core machine only ever adds
 * to (one of these once read 51 ms of wall time while jest ran 15 files on two workers).
 */
function warmMs(request: unknown): number {
  answerReference(request);
  let best = Infinity;
  for (let run = 0; run < 3; run++)
    best = Math.min(
      best,
      cpuMilliseconds(() => answerReference(request)),
    );
  return best;
}

function doubleOf(request: unknown): [string, string] {
  const a = answerReference(request);
  if ('error' in a) throw new Error(a.error);
  return [a.double.re, a.double.im];
}

describe('answerReference at the edges of issue 12', () => {
  // mpmath, 60 digits (720 working digits, Debian python3-mpmath through /usr/bin/python3), each part
  // rounded to binary64 from mpmath's exact binary value by tests/external/python/oracle.py.
  const points: OraclePoint[] = [
    { fn: 'pow', z: ['-1e300', '0'], w: '1/3' },
    { fn: 'cbrt', z: [MAX, MAX] },
    { fn: 'pow', z: ['-1', '0'], w: ['1/2', '1'] },
    { fn: 'pow', z: ['2.5', '-3'], w: ['1/3', '1/7'] },
    { fn: 'pow', z: ['-1e300', '1e-300'], w: ['-2/3', '0.5'] },
  ];
  let mpmath: { re_rounded: string; im_rounded: string }[] = [];
  beforeAll(() => {
    mpmath = askPython('mpmath', points);
  });
  const expected = (i: number) => [unhex(mpmath[i]!.re_rounded), unhex(mpmath[i]!.im_rounded)].map(formatDouble);

  it('answers pow(−1e300, 1/3) with the same bits whether w is written "1/3" or {"re": "1/3", "im": "0"}', () => {
    const z = { re: '-1e300', im: '0' };
    const ratio = doubleOf({ fn: 'pow', z, w: '1/3' });
    // The exact answer 5e99 + 8.660254037844387e99i, which mpmath confirms.
    expect(ratio).toEqual(['5e+99', '8.660254037844387e+99']);
    expect(ratio).toEqual(expected(0));
    expect(doubleOf({ fn: 'pow', z, w: { re: '1/3', im: '0' } })).toEqual(ratio);
    expect(doubleOf({ fn: 'pow', z, w: { re: '1/3', im: '-0' } })).toEqual(ratio);
  });

  it('takes a hex float in w exactly and refuses one beyond every double, naming the field', () => {
    const z = { re: '2', im: '1' };
    expect(doubleOf({ fn: 'pow', z, w: '0x1.8p1' })).toEqual(doubleOf({ fn: 'pow', z, w: '3' }));
    expect(answerReference({ fn: 'pow', z, w: '0x1p+999999' })).toEqual({
      error: expect.stringMatching(/^w "0x1p\+999999" is larger than any double/),
    });
    expect(answerReference({ fn: 'pow', z, w: { re: '1', im: '0x1p+2000' } })).toEqual({
      error: expect.stringMatching(/^w\.im "0x1p\+2000" is larger than any double/),
    });
  });

  it('keeps both parts of a complex w written as ratios exact', () => {
    expect(doubleOf({ fn: 'pow', z: { re: '2.5', im: '-3' }, w: { re: '1/3', im: '1/7' } })).toEqual(expected(3));
    expect(doubleOf({ fn: 'pow', z: { re: '-1e300', im: '1e-300' }, w: { re: '-2/3', im: '0.5' } })).toEqual(
      expected(4),
    );
  });

  it('takes a ratio or hex float in z exactly when it is a double and refuses it otherwise, naming the field', () => {
    expect(doubleOf({ fn: 'sqrt', z: { re: '-9/4', im: '0' } })).toEqual(
      doubleOf({ fn: 'sqrt', z: { re: '-2.25', im: '0' } }),
    );
    const refused = answerReference({ fn: 'sqrt', z: { re: '1', im: '1/3' } });
    expect(refused).toEqual({ error: expect.stringMatching(/^z\.im "1\/3" is not exactly a double/) });
    expect(answerReference({ fn: 'sqrt', z: { re: '0x1p+999999', im: '0' } })).toEqual({
      error: expect.stringMatching(/^z\.re "0x1p\+999999" is not exactly a double/),
    });
    expect(answerReference({ fn: 'sqrt', z: { re: '0x1.00000000000000000001p0', im: '0' } })).toEqual({
      error: expect.stringMatching(/^z\.re .* is not exactly a double/),
    });
    expect(doubleOf({ fn: 'sqrt', z: { re: '0x1p-1074', im: '-0/4' } })).toEqual(
      doubleOf({ fn: 'sqrt', z: { re: '5e-324', im: '-0' } }),
    );
  });

  it.each(['cbrt', 'pow'])('answers %s at z = MAX + MAX·i with the finite cube root', (fn) => {
    const request = { fn, z: { re: MAX, im: MAX }, ...(fn === 'pow' ? { w: '1/3' } : {}) };
    // The value 6.119096431615017e102 + 1.6396069472594085e102i, which mpmath confirms.
    expect(doubleOf(request)).toEqual(['6.119096431615017e+102', '1.6396069472594085e+102']);
    expect(doubleOf(request)).toEqual(expected(1));
  });

  it('answers exp(1e300 + 0i) with +inf + 0i and names the overflow', () => {
    // ISO/IEC 9899:2011 G.6.3.1: cexp(conj z) = conj(cexp z), and e^x is real for real x, so the
    // imaginary part is exactly ±0 with the sign of Im z; IEEE 754-2019 §7.4: a finite value
    // beyond the largest double rounds to +∞ (to nearest) and signals overflow.
    expect(answerReference({ fn: 'exp', z: { re: '1e300', im: '0' } })).toEqual({
      value: { re: 'inf', im: '0' },
      double: { re: 'inf', im: '0' },
      flags: ['overflow'],
    });
    expect(doubleOf({ fn: 'exp', z: { re: '1e300', im: '-0' } })).toEqual(['inf', '-0']);
  });

  it('rounds e^x below the subnormals to +0 and to a subnormal, naming the underflow', () => {
    // IEEE 754-2019 §7.5: a tiny, inexact result signals underflow; e^−1000 ≈ 5.1e−435 rounds to
    // +0 and e^−745 ≈ 4.9e−324 to the least subnormal (value from memory: 2^−1074 ≈ 4.94e−324).
    expect(answerReference({ fn: 'exp', z: { re: '-1000', im: '0' } })).toMatchObject({
      double: { re: '0', im: '0' },
      flags: ['underflow'],
    });
    expect(answerReference({ fn: 'exp', z: { re: '-745', im: '0' } })).toMatchObject({
      double: { re: '5e-324', im: '0' },
      flags: ['underflow'],
    });
    expect(answerReference({ fn: 'exp', z: { re: '-1e300', im: '2' } })).toMatchObject({
      double: { re: '-0', im: '0' },
      flags: ['underflow'],
    });
  });

  it('answers pow(1, ½ + i) = 1 exactly and pow(−1, ½ + i) with an exactly zero real part, each within 50 ms', () => {
    expect(answerReference({ fn: 'pow', z: { re: '1', im: '0' }, w: { re: '1/2', im: '1' } })).toEqual({
      value: { re: '1', im: '0' },
      double: { re: '1', im: '0' },
    });
    // (−1)^(½+i) = e^(iπ(½+i)) = e^−π · i: the real part is exactly 0 (our rule: +0, see pow's TSDoc).
    const minusOne = { fn: 'pow', z: { re: '-1', im: '0' }, w: { re: '0.5', im: '1' } };
    expect(answerReference(minusOne)).not.toHaveProperty('warning');
    expect(doubleOf(minusOne)).toEqual(['0', expected(2)[1]]);
    expect(warmMs(minusOne)).toBeLessThan(50);
    expect(warmMs({ fn: 'pow', z: { re: '1', im: '0' }, w: { re: '0.5', im: '1' } })).toBeLessThan(50);
  });

  it('answers an exact power that is a midpoint between two doubles by ties-to-even, within 50 ms', () => {
    // (262143²)^(3/2) = 262143³ = 18014192351838207 (exact integer arithmetic), odd and between
    // 2^53 and 2^54, so halfway between the doubles …206 and …208; IEEE 754-2019 §4.3.1
    // roundTiesToEven picks …208, whose significand is even.
    const s = 262143n;
    const request = { fn: 'pow', z: { re: String(s * s), im: '0' }, w: '3/2' };
    expect(String(s ** 3n)).toBe('18014192351838207');
    expect(answerReference(request)).toEqual({
      value: { re: '18014192351838207', im: '0' },
      double: { re: '18014192351838208', im: '0' },
    });
    expect(warmMs(request)).toBeLessThan(50);
    // (−8)^(1/3) = 2·e^(iπ/3) = 1 + √3·i (DLMF 4.2.26): the real part is exactly 1.
    const cube = answerReference({ fn: 'pow', z: { re: '-8', im: '0' }, w: '1/3', digits: 60 });
    expect(cube).toMatchObject({ value: { re: '1' }, double: { re: '1', im: '1.7320508075688772' } });
    // 2^−1074 is the least subnormal exactly: tiny but exact, so no underflow (IEEE 754-2019 §7.5).
    expect(answerReference({ fn: 'pow', z: { re: '2', im: '0' }, w: '-1074' })).not.toHaveProperty('flags');
  });

  it('settles acsch at its branch points ±i, where 1/z is exact, without escalating', () => {
    // DLMF 4.37.17 (acsch z = asinh(1/z)), at z = i: asinh(−i) = −iπ/2 (value from memory).
    const a = answerReference({ fn: 'acsch', z: { re: '0', im: '1' } });
    expect(a).toEqual({
      value: { re: '0', im: '-1.570796326794896619231321691639751442099' },
      double: { re: '0', im: '-1.5707963267948966' },
    });
    expect(warmMs({ fn: 'acsch', z: { re: '0', im: '1' } })).toBeLessThan(50);
  });
});

const TINY = '5e-324';
const NORMAL_MIN = '2.2250738585072014e-308';

/** The request fields after z that each catalogue function needs. */
function argumentsOf(fn: string): { w?: string; n?: number } {
  if (fn === 'pow') return { w: '-2/5' };
  return fn === 'nthroot' ? { n: 3 } : {};
}

describe('every catalogue function at the ends of binary64', () => {
  const zs: [string, string][] = [
    [MAX, MAX],
    [`-${MAX}`, MAX],
    [MAX, `-${TINY}`],
    [TINY, TINY],
    [`-${TINY}`, NORMAL_MIN],
    ['1e-310', `-${MAX}`],
  ];
  const inputs: SweepInput[] = Object.keys(FUNCTION_ARITY).flatMap((fn) =>
    zs.map(([re, im]) => ({
      fn,
      z: { re, im },
      convention: 'signed-zero' as const,
      category: 'ends',
      ...argumentsOf(fn),
    })),
  );
  const answers = inputs.map(({ category: _category, ...request }) => answerReference(request));

  it('answers each without an error, a NaN or an undecided rounding', () => {
    const bad = answers
      .map((a, i) => ({ a, z: inputs[i]!.z, fn: inputs[i]!.fn }))
      .filter(({ a }) => {
        return 'error' in a || a.double.re === 'nan' || a.double.im === 'nan' || a.warning !== undefined;
      });
    expect(bad).toEqual([]);
  });

  it('agrees bit for bit with mpmath', () => {
    // mpmath, 60 digits on 720 + 2·(orders of magnitude between the parts) working digits.
    const agreement = compareWithMpmath(inputs, answers, inputs.length);
    expect(agreement).toMatchObject({ compared: inputs.length, disagreements: [] });
  });
});

describe('exact zeros on the real axis', () => {
  // Where a function maps a stretch of the real axis to itself its value there is real: the
  // imaginary part is exactly a zero, and f(x − 0i) = conj f(x + 0i) gives the two zeros opposite
  // signs (ISO/IEC 9899:2011 G.6 states conjugate symmetry for cexp, clog, csqrt and the inverse
  // functions; DLMF 4.2, 4.23, 4.37 for the reciprocal ones and for z^w with real w).
  const real: [string, string[]][] = [
    ['sqrt', ['2', '1e300', TINY]],
    ['log', ['2', '1e300', TINY]],
    ['exp', ['1e300', '-1e300', '709.5', '-745.5', '3']],
    ['cbrt', ['8', '1e-300']],
    ['nthroot', ['8', MAX]],
    ['pow', ['2', '1e-300']],
    ['asin', ['0.5', '-0.75', '1e-300']],
    ['acos', ['0.5', '-0.75']],
    ['atan', ['3', '-1e300', TINY]],
    ['asinh', ['3', '-1e300', TINY]],
    ['acosh', ['1.5', '1e300']],
    ['atanh', ['0.5', '-0.75', '1e-300']],
    ['acot', ['3', '-1e-300']],
    ['asec', ['2', '-1e300']],
    ['acsc', ['2', '-1e300']],
    ['acoth', ['2', '-3']],
    ['asech', ['0.5', '1e-300']],
    ['acsch', ['3', '-1e-300']],
  ];
  const cases = real.flatMap(([fn, xs]) => xs.map((x) => ({ fn, x })));
  let mpmath: { re_rounded: string; im_rounded: string }[] = [];
  beforeAll(() => {
    const points: OraclePoint[] = cases.map(({ fn, x }) => ({ fn, z: [x, '0'], ...argumentsOf(fn) }));
    mpmath = askPython('mpmath', points);
  });

  it.each(cases.map((c, i) => [c.fn, c.x, i] as const))(
    'answers %s(%s ± 0i) with an exact zero imaginary part of the sign of Im z, promptly',
    (fn, x, i) => {
      const upper = { fn, z: { re: x, im: '0' }, ...argumentsOf(fn) };
      const lower = { ...upper, z: { re: x, im: '-0' } };
      const [re, im] = doubleOf(upper);
      const [reLower, imLower] = doubleOf(lower);
      expect([re, reLower]).toEqual([formatDouble(unhex(mpmath[i]!.re_rounded)), re]);
      expect(['0', '-0']).toContain(im);
      expect(imLower).toBe(im === '0' ? '-0' : '0');
      expect(answerReference(upper)).not.toHaveProperty('warning');
      expect(warmMs(upper)).toBeLessThan(50);
    },
  );
});
