import { formatDouble } from '../../harness/reference/numbers/format-double';
import { C_RULE } from './c-rule-where-cmath-raises';
import type { CmathAnswer } from './cmath-answer';
import { referenceDouble } from './reference-double';
import { sameDouble } from './same-double';
import { unhex } from './unhex';

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
  const ok = (a: number, b: number, free: boolean) =>
    free ? sameDouble(Math.abs(a), Math.abs(b), ulps) : sameDouble(a, b, ulps);
  if (ok(re, expected[0], loose.re) && ok(im, expected[1], loose.im)) return null;
  return `${fn}(${formatDouble(x)} + ${formatDouble(y)}i): ours ${formatDouble(re)} + ${formatDouble(im)}i, expected ${formatDouble(expected[0])} + ${formatDouble(expected[1])}i${answer.raises ? ' (C rule; cmath raises)' : ''}`;
}
