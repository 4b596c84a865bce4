const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const HEX = /^([+-]?)0[xX]([0-9a-fA-F]+\.?[0-9a-fA-F]*|\.[0-9a-fA-F]+)(?:[pP]([+-]?\d+))?$/;
const RATIO = /^([+-]?)(\d+)\/(\d+)$/;

/**
 * The double a wire number (docs/suite-format.md) names, rounded as the harness reads path
 * geometry (harness/paths/geometry-number.ts): a decimal to the nearest double through `Number()`
 * (correctly rounded, ECMA-262 §7.1.4.1.1), a C hex float or a ratio "p/q" rounded to nearest,
 * ties to even, from its exact value, subnormals included; "inf", "infinity", "nan" as IEEE
 * values; "-0" as −0. Text that is none of these, and a ratio over 0, read as NaN.
 *
 * The shared schema needs it to refuse geometry that samples nothing (a radius that rounds to
 * 0, corners that round to the same double) before the harness is loaded;
 * tests/shared/wire-double.test.ts holds it equal to the reference engine's parseDouble.
 */
export function wireDouble(text: string): number {
  const t = text.trim();
  const lower = t.toLowerCase().replace(/^\+/, '');
  if (lower === 'inf' || lower === 'infinity') return Infinity;
  if (lower === '-inf' || lower === '-infinity') return -Infinity;
  if (lower === 'nan' || lower === '-nan') return NaN;
  if (DECIMAL.test(t)) return Number(t);
  const ratio = RATIO.exec(t);
  if (ratio) {
    const den = BigInt(ratio[3] as string);
    return den === 0n ? NaN : roundToDouble(ratio[1] === '-', BigInt(ratio[2] as string), den);
  }
  const hex = HEX.exec(t);
  if (!hex) return NaN;
  const [whole = '', frac = ''] = (hex[2] as string).split('.');
  const digits = BigInt(`0x${whole + frac || '0'}`);
  const exponent = Number(hex[3] ?? '0') - 4 * frac.length;
  const negative = hex[1] === '-';
  if (digits === 0n) return negative ? -0 : 0;
  // Past these bounds the value is beyond every double or below half the least subnormal, and
  // the shift below would build numbers of up to a million bits for nothing.
  if (exponent > 1100) return negative ? -Infinity : Infinity;
  if (exponent + bitLength(digits) < -1100) return negative ? -0 : 0;
  return exponent >= 0
    ? roundToDouble(negative, digits << BigInt(exponent), 1n)
    : roundToDouble(negative, digits, 1n << BigInt(-exponent));
}

/** num/den (num ≥ 0, den > 0) to the nearest double, ties to even; beyond the largest double, ∞. */
function roundToDouble(negative: boolean, num: bigint, den: bigint): number {
  const sign = negative ? -1 : 1;
  if (num === 0n) return negative ? -0 : 0;
  // e = floor(log2(num/den)), so the value lies in [2^e, 2^(e+1)).
  let e = bitLength(num) - bitLength(den);
  if (e >= 0 ? num < den << BigInt(e) : num << BigInt(-e) < den) e -= 1;
  if (e > 1023) return sign * Infinity;
  // The place of the last bit the double keeps: 52 below the leading one, never below 2^-1074.
  const last = Math.max(e - 52, -1074);
  const n = last >= 0 ? num : num << BigInt(-last);
  const d = last >= 0 ? den << BigInt(last) : den;
  let q = n / d;
  const twice = 2n * (n - q * d);
  if (twice > d || (twice === d && (q & 1n) === 1n)) q += 1n;
  // q ≤ 2^53 is exact as a double, and so is q·2^last wherever the result is finite.
  return sign * Number(q) * 2 ** last;
}

function bitLength(x: bigint): number {
  return x.toString(2).length;
}
