import { formatDouble } from '../../harness/reference/numbers/format-double';
import { unhex, type OraclePoint } from './python-oracle';
import { referenceDouble } from './reference-double';
import { sameDouble } from './same-double';

export const FUNCTIONS = ['sqrt', 'exp', 'log', 'asin', 'acos', 'atan', 'asinh', 'acosh', 'atanh'] as const;
export const SPECIAL = [0, -0, 1, -1, 2.5, -2.5, Infinity, -Infinity, NaN];
/** cmath is faithful, not correctly rounded: finite non-special values may differ by an ulp or two. */
export const CMATH_ULPS = 2;

/**
 * Parts whose sign ISO/IEC 9899:2011 G.6 leaves unspecified (from memory of G.6) ("where the sign of the … part of
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

/** Where cmath raises, the value C returns (ISO/IEC 9899:2011 clause beside each; rules written from memory of G.6). */
export const C_RULE: Record<string, (x: number, y: number) => [number, number] | undefined> = {
  // G.6.3.2: clog(−0 + i0) = −∞ + iπ, clog(+0 + i0) = −∞ + i0; conjugate symmetric.
  log: (x, y) => (x === 0 && y === 0 ? [-Infinity, Object.is(x, -0) ? Math.sign(1 / y) * Math.PI : y] : undefined),
  // G.6.2.3: catanh(+1 + i0) = +∞ + i0; odd and conjugate symmetric.
  atanh: (x, y) => (Math.abs(x) === 1 && y === 0 ? [x * Infinity, y] : undefined),
  // G.6.3.1: cexp(x + i∞) = NaN + iNaN for finite x (invalid); cexp(+∞ ± i∞) = ±∞ + iNaN.
  exp: (x, y) => (Math.abs(y) === Infinity ? (x === Infinity ? [Infinity, NaN] : [NaN, NaN]) : undefined),
  // catan z = −i catanh(iz): catan(±0 ± i) is −i·catanh(∓1 ± 0i) = ±0 ± i∞.
  atan: (x, y) => (x === 0 && Math.abs(y) === 1 ? [x, y * Infinity] : undefined),
};

export interface CmathAnswer {
  re?: string;
  im?: string;
  raises?: string;
}

/**
 * Compares a value with cmath's answer sign-exactly (or with the C rule where cmath raises); returns
 * a description of the mismatch, or null. `evaluate` is the function under check, ours by default.
 */
export function compareWithCmath(
  fn: string,
  x: number,
  y: number,
  answer: CmathAnswer,
  ulps: number,
  evaluate: (fn: string, x: number, y: number) => [number, number] = referenceDouble,
): string | null {
  const [re, im] = evaluate(fn, x, y);
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

/** Points on every cut, with +0 and −0 across it. */
export const CUTS: Record<string, [number, number][]> = {
  sqrt: [[-4, 0], [-0.5, 0], [-1e300, 0], [-5e-324, 0], [-2.5, 0]],
  log: [[-4, 0], [-0.5, 0], [-1e300, 0], [-5e-324, 0], [-1, 0]],
  asin: [[2, 0], [-2, 0], [1.5, 0], [-1e10, 0], [1e300, 0], [1 + 2 ** -52, 0]],
  acos: [[2, 0], [-2, 0], [1.5, 0], [-1e10, 0], [1e300, 0], [-1 - 2 ** -52, 0]],
  atanh: [[2, 0], [-2, 0], [1.5, 0], [-1e10, 0], [1e300, 0], [1 + 2 ** -52, 0]],
  acosh: [[0.5, 0], [-0.5, 0], [-2, 0], [-1e300, 0], [1 - 2 ** -53, 0], [-1, 0]],
  asinh: [[0, 2], [0, -2], [0, 1.5], [0, -1e10], [0, 1e300], [0, 1 + 2 ** -52]],
  atan: [[0, 2], [0, -2], [0, 1.5], [0, -1e10], [0, 1e300], [0, -1 - 2 ** -52]],
};

/** Each cut point with both zero signs across the cut (and along it when that part is zero too). */
export function cutPointsOf(cuts: Record<string, [number, number][]>): OraclePoint[] {
  const out: OraclePoint[] = [];
  for (const [fn, points] of Object.entries(cuts)) {
    for (const [x, y] of points) {
      for (const sx of [1, -1]) {
        for (const sy of [1, -1]) {
          if ((x !== 0 && sx < 0) || (y !== 0 && sy < 0)) continue;
          out.push({ fn, z: [formatDouble(x === 0 ? sx * 0 : x), formatDouble(y === 0 ? sy * 0 : y)] });
        }
      }
    }
  }
  return out;
}
