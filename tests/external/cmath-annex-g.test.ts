import { formatDouble } from '../../harness/reference/numbers/format-double';
import { parseDouble } from '../../harness/reference/numbers/parse-double';
import { askPython, unhex, type OraclePoint } from './python-oracle';
import { referenceDouble } from './reference-double';
import { sameDouble } from './same-double';

// Python's cmath (Debian python3, /usr/bin/python3) follows ISO/IEC 9899 Annex G for special
// values and signed zeros (its documentation says so); it raises ValueError where C returns a
// value and signals divide-by-zero or invalid. All comparisons in this file are against cmath
// from one batch, except the rows cmath refuses, which are checked against the C rule itself.

const FUNCTIONS = ['sqrt', 'exp', 'log', 'asin', 'acos', 'atan', 'asinh', 'acosh', 'atanh'] as const;
const SPECIAL = [0, -0, 1, -1, 2.5, -2.5, Infinity, -Infinity, NaN];
/** cmath is faithful, not correctly rounded: finite non-special values may differ by an ulp or two. */
const CMATH_ULPS = 2;

/**
 * Parts whose sign ISO/IEC 9899:2011 G.6 leaves unspecified ("where the sign of the … part of
 * the result is unspecified"); there only the magnitude (or NaN-ness) is compared.
 */
function unspecifiedSign(fn: string, x: number, y: number): { re: boolean; im: boolean } {
  const inf = (v: number) => Math.abs(v) === Infinity;
  const nan = (v: number) => v !== v;
  switch (fn) {
    case 'exp': // G.6.3.1: cexp(−∞ ± i∞), cexp(−∞ + iNaN) = ±0 ± i0; cexp(+∞ ± i∞ or iNaN) = ±∞ + iNaN
      if (x === -Infinity && (inf(y) || nan(y))) return { re: true, im: true };
      if (x === Infinity && (inf(y) || nan(y))) return { re: true, im: false };
      return { re: false, im: false };
    case 'sqrt': // G.6.4.2: csqrt(−∞ + iNaN) = NaN ± i∞
      return { re: false, im: x === -Infinity && nan(y) };
    case 'acos': // G.6.1.1: cacos(±∞ + iNaN) = NaN ± i∞
      return { re: false, im: inf(x) && nan(y) };
    case 'asinh': // G.6.2.2: casinh(NaN ± i∞) = ±∞ + iNaN
      return { re: nan(x) && inf(y), im: false };
    case 'asin': // casin z = −i casinh(iz): casinh's unspecified real part becomes the imaginary part
      return { re: false, im: inf(x) && nan(y) };
    case 'atanh': // G.6.2.3: catanh(NaN ± i∞) = ±0 ± iπ/2
      return { re: nan(x) && inf(y), im: false };
    case 'atan': // catan z = −i catanh(iz)
      return { re: false, im: inf(x) && nan(y) };
    default:
      return { re: false, im: false };
  }
}

/** Where cmath raises, the value C returns (ISO/IEC 9899:2011 clause beside each). */
const C_RULE: Record<string, (x: number, y: number) => [number, number] | undefined> = {
  // G.6.3.2: clog(−0 + i0) = −∞ + iπ, clog(+0 + i0) = −∞ + i0; conjugate symmetric.
  log: (x, y) => (x === 0 && y === 0 ? [-Infinity, Object.is(x, -0) ? Math.sign(1 / y) * Math.PI : y] : undefined),
  // G.6.2.3: catanh(+1 + i0) = +∞ + i0; odd and conjugate symmetric.
  atanh: (x, y) => (Math.abs(x) === 1 && y === 0 ? [x * Infinity, y] : undefined),
  // G.6.3.1: cexp(x + i∞) = NaN + iNaN for finite x (invalid); cexp(+∞ ± i∞) = ±∞ + iNaN.
  exp: (x, y) => (Math.abs(y) === Infinity ? (x === Infinity ? [Infinity, NaN] : [NaN, NaN]) : undefined),
  // catan z = −i catanh(iz): catan(±0 ± i) is −i·catanh(∓1 ± 0i) = ±0 ± i∞.
  atan: (x, y) => (x === 0 && Math.abs(y) === 1 ? [x, y * Infinity] : undefined),
};

interface CmathAnswer {
  re?: string;
  im?: string;
  raises?: string;
}

function compare(fn: string, x: number, y: number, answer: CmathAnswer, ulps: number): string | null {
  const [re, im] = referenceDouble(fn, x, y);
  let expected: [number, number];
  if (answer.raises) {
    const rule = C_RULE[fn]?.(x, y);
    if (!rule) return `cmath raises ${answer.raises} at ${fn}(${x}, ${y}) and no C rule is recorded`;
    expected = rule;
  } else {
    expected = [unhex(answer.re as string), unhex(answer.im as string)];
  }
  const loose = unspecifiedSign(fn, x, y);
  const ok = (a: number, b: number, free: boolean) => (free ? sameDouble(Math.abs(a), Math.abs(b), ulps) : sameDouble(a, b, ulps));
  if (ok(re, expected[0], loose.re) && ok(im, expected[1], loose.im)) return null;
  return `${fn}(${formatDouble(x)} + ${formatDouble(y)}i): ours ${formatDouble(re)} + ${formatDouble(im)}i, expected ${formatDouble(expected[0])} + ${formatDouble(expected[1])}i${answer.raises ? ' (C rule; cmath raises)' : ''}`;
}

const grid: OraclePoint[] = [];
for (const fn of FUNCTIONS) for (const x of SPECIAL) for (const y of SPECIAL) grid.push({ fn, z: [formatDouble(x), formatDouble(y)] });

/** Points on every cut, with +0 and −0 across it. */
const CUTS: Record<string, [number, number][]> = {
  sqrt: [[-4, 0], [-0.5, 0], [-1e300, 0], [-5e-324, 0], [-2.5, 0]],
  log: [[-4, 0], [-0.5, 0], [-1e300, 0], [-5e-324, 0], [-1, 0]],
  asin: [[2, 0], [-2, 0], [1.5, 0], [-1e10, 0], [1e300, 0], [1 + 2 ** -52, 0]],
  acos: [[2, 0], [-2, 0], [1.5, 0], [-1e10, 0], [1e300, 0], [-1 - 2 ** -52, 0]],
  atanh: [[2, 0], [-2, 0], [1.5, 0], [-1e10, 0], [1e300, 0], [1 + 2 ** -52, 0]],
  acosh: [[0.5, 0], [-0.5, 0], [-2, 0], [-1e300, 0], [1 - 2 ** -53, 0], [-1, 0]],
  asinh: [[0, 2], [0, -2], [0, 1.5], [0, -1e10], [0, 1e300], [0, 1 + 2 ** -52]],
  atan: [[0, 2], [0, -2], [0, 1.5], [0, -1e10], [0, 1e300], [0, -1 - 2 ** -52]],
};
const cutPoints: OraclePoint[] = [];
for (const [fn, points] of Object.entries(CUTS)) {
  for (const [x, y] of points) {
    for (const sx of [1, -1]) {
      for (const sy of [1, -1]) {
        const px = x === 0 ? sx * 0 : x;
        const py = y === 0 ? sy * 0 : y;
        if ((x !== 0 && sx < 0) || (y !== 0 && sy < 0)) continue;
        cutPoints.push({ fn, z: [formatDouble(px), formatDouble(py)] });
      }
    }
  }
}

describe('principal values against Python cmath (ISO/IEC 9899 Annex G)', () => {
  const specialAnswers = askPython<CmathAnswer>('cmath', grid);
  const cutAnswers = askPython<CmathAnswer>('cmath', cutPoints);

  it.each(FUNCTIONS.map((fn) => [fn]))('matches every Annex G special value of %s sign-exactly', (fn) => {
    const failures: string[] = [];
    grid.forEach((p, i) => {
      if (p.fn !== fn) return;
      const result = compare(fn, parseDouble(p.z[0]), parseDouble(p.z[1]), specialAnswers[i] as CmathAnswer, CMATH_ULPS);
      if (result) failures.push(result);
    });
    expect(failures).toEqual([]);
  });

  it.each(Object.keys(CUTS).map((fn) => [fn]))('takes the side of each %s cut that the zero sign names, as cmath does', (fn) => {
    const failures: string[] = [];
    cutPoints.forEach((p, i) => {
      if (p.fn !== fn) return;
      const result = compare(fn, parseDouble(p.z[0]), parseDouble(p.z[1]), cutAnswers[i] as CmathAnswer, CMATH_ULPS);
      if (result) failures.push(result);
    });
    expect(failures).toEqual([]);
  });

  it('records which rows cmath refuses, so the C rules above are exercised', () => {
    const refused = grid.filter((_, i) => specialAnswers[i]?.raises).map((p) => `${p.fn}(${p.z.join(', ')})`);
    expect(refused.length).toBeGreaterThan(0);
    for (const row of refused) expect(Object.keys(C_RULE)).toContain(row.slice(0, row.indexOf('(')));
  });
});
