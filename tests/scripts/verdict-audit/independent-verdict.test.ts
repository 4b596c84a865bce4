import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { parseDouble } from '../../../harness/reference/numbers/parse-double';
import {
  independentVerdict,
  type AuditPoint,
  type IndependentValue,
} from '../../../scripts/verdict-audit/independent-verdict';

const SCRIPT = path.join(__dirname, '..', '..', '..', 'scripts', 'verdict-audit', 'independent_values.py');
const NEGATIVE_REAL_AXIS = [{ axis: 'real' as const, from: '-Infinity', to: '0' }];

function mpmathValues(points: AuditPoint[]): IndependentValue[] {
  const run = spawnSync('/usr/bin/python3', [SCRIPT], { input: JSON.stringify({ points }), encoding: 'utf8' });
  if (run.status !== 0) throw new Error(run.stderr);
  return JSON.parse(run.stdout) as IndependentValue[];
}

const sqrtAt = (z: [string, string], convention: AuditPoint['convention']): AuditPoint => ({
  fn: 'sqrt',
  cuts: NEGATIVE_REAL_AXIS,
  inner: null,
  convention,
  z,
});

describe('the verdict audit’s independent values (mpmath alone)', () => {
  it('reads a signed zero as the limit from its side: sqrt(−4 ∓ 0i) = +0 ∓ 2i', () => {
    // ISO/IEC 9899:2011 G.6.4.2: csqrt(conj(z)) = conj(csqrt(z)), csqrt(−4 + 0i) = +0 + 2i.
    const [below, above] = mpmathValues([
      sqrtAt(['-0x1p+2', '-0x0p+0'], 'signed-zero'),
      sqrtAt(['-0x1p+2', '0x0p+0'], 'signed-zero'),
    ]);
    expect(below).toEqual({ re: '0x0.0p+0', im: '-0x1.0000000000000p+1' });
    expect(above).toEqual({ re: '0x0.0p+0', im: '0x1.0000000000000p+1' });
  });

  it('reads a signed zero beside a subnormal part as the limit from its side: log(−5e−324 ∓ 0i) = ln(5e−324) ∓ πi', () => {
    // ISO/IEC 9899:2011 G.6.3.2: clog(−x ± 0i) = ln x ± iπ for x > 0. A displacement of 1e−250 (not relative
    // to |z|) moved this point to −5e−324 − 1e−250i, whose logarithm is −690.78 − 1.57i.
    const [below, above] = mpmathValues([
      {
        fn: 'log',
        cuts: NEGATIVE_REAL_AXIS,
        inner: null,
        convention: 'signed-zero',
        z: ['-0x0.0000000000001p-1022', '-0x0p+0'],
      },
      {
        fn: 'log',
        cuts: NEGATIVE_REAL_AXIS,
        inner: null,
        convention: 'signed-zero',
        z: ['-0x0.0000000000001p-1022', '0x0p+0'],
      },
    ]) as { re: string; im: string }[];
    expect([parseDouble(below!.re), parseDouble(below!.im)]).toEqual([-744.4400719213812, -Math.PI]);
    expect([parseDouble(above!.re), parseDouble(above!.im)]).toEqual([-744.4400719213812, Math.PI]);
  });

  it('takes the upper side of the negative real axis under counter-clockwise continuity, whatever the zero’s sign', () => {
    // Kahan 1987, "Branch cuts for complex elementary functions": the cut (−∞, 0] is met from above.
    const [value] = mpmathValues([sqrtAt(['-0x1p+2', '-0x0p+0'], 'counter-clockwise')]);
    expect(value).toEqual({ re: '0x0.0p+0', im: '0x1.0000000000000p+1' });
  });

  it('takes acos’s lower side at 1/z for asec on (0, 1) under counter-clockwise continuity', () => {
    // asec z = acos(1/z) (DLMF 4.23.8); Python's cmath.acos(2 − 0j) = 0 + 0x1.5124271980434p+0 i (run on
    // Debian's python3), which is within one ulp of the correctly rounded value.
    const [value] = mpmathValues([
      {
        fn: 'asec',
        cuts: [],
        inner: {
          fn: 'acos',
          cuts: [
            { axis: 'real', from: '-Infinity', to: '-1' },
            { axis: 'real', from: '1', to: 'Infinity' },
          ],
        },
        convention: 'counter-clockwise',
        z: ['0x1p-1', '0x0p+0'],
      },
    ]);
    expect(value).toEqual({ re: '0x0.0p+0', im: expect.stringMatching(/^0x1\.512427198043[45]p\+0$/) });
  });

  it('says where mpmath has no value instead of guessing: acsc at 0', () => {
    const [value] = mpmathValues([
      {
        fn: 'acsc',
        cuts: [],
        inner: { fn: 'asin', cuts: [] },
        convention: 'signed-zero',
        z: ['0x0p+0', '0x0p+0'],
      },
    ]);
    expect(value).toHaveProperty('unchecked');
  });
});

describe('independentVerdict', () => {
  const point = (actual: [string, string], tolerance: AuditPoint['tolerance']): AuditPoint => ({
    ...sqrtAt(['-0x1p+2', '-0x0p+0'], 'signed-zero'),
    actual,
    tolerance,
  });
  const reference: IndependentValue = { re: '0x0.0p+0', im: '-0x1.0000000000000p+1' };

  it('fails a zero of the other sign under the signed-zero convention', () => {
    expect(independentVerdict(point(['-0x0p+0', '-0x1p+1'], { ulps: 4 }), reference)).toBe('fail');
    expect(independentVerdict(point(['0x0p+0', '-0x1p+1'], { ulps: 4 }), reference)).toBe('pass');
  });

  it('holds each part to the ulps and the whole value to the relative bound', () => {
    // −2 moved 5 doubles: 5 ulps, relative error 5·2^−52 ≈ 1.1e−15.
    const moved = point(['0x0p+0', '-0x1.0000000000005p+1'], { ulps: 4 });
    expect(independentVerdict(moved, reference)).toBe('fail');
    expect(independentVerdict({ ...moved, tolerance: { ulps: 5 } }, reference)).toBe('pass');
    expect(independentVerdict({ ...moved, tolerance: { relative: 1e-15 } }, reference)).toBe('fail');
    expect(independentVerdict({ ...moved, tolerance: { relative: 2e-15 } }, reference)).toBe('pass');
  });

  it('with both bounds, passes on either, but not a tiny part of the opposite sign on the relative one', () => {
    // A real part of ∓2^−54 beside −2i: 2^−55 relative either way, 1e18 ulps from +0 apart.
    const both = { ulps: 4, relative: 4 * Number.EPSILON };
    const tiny: IndependentValue = { re: '0x1p-54', im: '-0x1.0000000000000p+1' };
    expect(independentVerdict(point(['0x1.8p-54', '-0x1p+1'], both), tiny)).toBe('pass');
    expect(independentVerdict(point(['-0x1p-54', '-0x1p+1'], both), tiny)).toBe('fail');
    expect(independentVerdict(point(['-0x1p-54', '-0x1p+1'], { relative: 4 * Number.EPSILON }), tiny)).toBe('pass');
  });

  it('passes an infinity only against the same infinity', () => {
    const inf: IndependentValue = { re: 'inf', im: '0x0.0p+0' };
    expect(independentVerdict(point(['inf', '0x0p+0'], { ulps: 4 }), inf)).toBe('pass');
    expect(independentVerdict(point(['-inf', '0x0p+0'], { ulps: 4 }), inf)).toBe('fail');
  });
});

describe('the verdict audit’s regular branches (mpmath alone)', () => {
  it('continues √(z² − 1) from √3 at 2 to i√2 at i, off the cut [−1, 1]', () => {
    // The branch with f(2) = √3 behaves like z at ∞, so on the imaginary axis f(iy) = i√(y² + 1)
    // (worked by hand from f = |g/g(z0)|^ν e^{iνΔarg g} f0 along the arc from 2 to i).
    const [value] = mpmathValues([
      {
        fn: 'regular',
        cuts: [],
        inner: null,
        convention: 'signed-zero',
        regular: {
          g: 'z^2 - 1',
          nu: ['1/2', '0'],
          z0: ['2', '0'],
          k: 0,
          cuts: [
            {
              points: [
                ['-1', '0'],
                ['1', '0'],
              ],
              to_infinity: false,
            },
          ],
        },
        z: ['0x0p+0', '0x1p+0'],
      },
    ]);
    const { re, im } = value as { re: string; im: string };
    // Re f(i) is 0: mpmath at 720 digits leaves at most round-off far below the least double.
    expect(re).toMatch(/^-?0x(0\.0p\+0|1\.[0-9a-f]+p-(2\d{3}|1\d{3}))$/);
    expect(im).toBe('0x1.6a09e667f3bcdp+0'); // √2 correctly rounded (common knowledge: 1.4142135623730951)
  });
});
