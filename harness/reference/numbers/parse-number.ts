import { BigFloat } from './big-float';
import { Rational } from './rational';

/** A parsed wire number: special values stay IEEE, everything else is exact. */
export type ParsedNumber =
  { kind: 'special'; value: BigFloat } | { kind: 'exact'; value: Rational; negativeZero: boolean };

const DECIMAL = /^([+-]?)(\d+\.?\d*|\.\d+)(?:[eE]([+-]?\d+))?$/;
const HEX = /^([+-]?)0[xX]([0-9a-fA-F]+\.?[0-9a-fA-F]*|\.[0-9a-fA-F]+)(?:[pP]([+-]?\d+))?$/;
const RATIO = /^([+-]?\d+)\/(\d+)$/;
const MAX_EXPONENT_DIGITS = 6;

/**
 * Reads a number in the wire format of docs/suite-format.md exactly: decimal strings,
 * C hex floats ("-0x1.8p+1"), ratios "p/q", and "inf", "-inf", "nan", "-0".
 * Throws a RangeError naming the text when it is none of these.
 */
export function parseNumber(text: string): ParsedNumber {
  const t = text.trim();
  const lower = t.toLowerCase();
  if (lower === 'nan' || lower === '+nan' || lower === '-nan') return { kind: 'special', value: BigFloat.NAN };
  if (lower === 'inf' || lower === '+inf' || lower === 'infinity' || lower === '+infinity') {
    return { kind: 'special', value: BigFloat.INF };
  }
  if (lower === '-inf' || lower === '-infinity') return { kind: 'special', value: BigFloat.NEG_INF };
  const ratio = RATIO.exec(t);
  if (ratio) {
    const den = BigInt(ratio[2] as string);
    if (den === 0n) throw new RangeError(`"${text}" has a zero denominator`);
    const num = BigInt(ratio[1] as string);
    return { kind: 'exact', value: new Rational(num, den), negativeZero: num === 0n && t.startsWith('-') };
  }
  const dec = DECIMAL.exec(t);
  if (dec) return positional(text, dec, 10);
  const hex = HEX.exec(t);
  if (hex) return positional(text, hex, 16);
  throw new RangeError(`"${text}" is not a number (expected decimal, hex float, p/q, inf, -inf or nan)`);
}

/**
 * The exact value of digits in base 10 (exponent of 10) or base 16 (C hex float, exponent of 2):
 * sign, digits with an optional point, exponent.
 */
function positional(text: string, match: RegExpExecArray, radix: 10 | 16): ParsedNumber {
  const [, sign, body, exp] = match as unknown as [string, string, string, string | undefined];
  if (exp !== undefined && exp.replace(/^[+-]/, '').length > MAX_EXPONENT_DIGITS) {
    throw new RangeError(`"${text}" has an exponent out of range`);
  }
  const [whole = '', frac = ''] = body.split('.');
  const digits = (whole + frac).replace(/^0+(?=.)/, '') || '0';
  const num = radix === 10 ? BigInt(digits) : BigInt('0x' + digits);
  const negative = sign === '-';
  const signed = negative ? -num : num;
  let value: Rational;
  if (radix === 10) {
    const e10 = Number(exp ?? '0') - frac.length;
    value = e10 >= 0 ? new Rational(signed * 10n ** BigInt(e10)) : new Rational(signed, 10n ** BigInt(-e10));
  } else {
    const e2 = Number(exp ?? '0') - 4 * frac.length;
    value = e2 >= 0 ? new Rational(signed << BigInt(e2)) : new Rational(signed, 1n << BigInt(-e2));
  }
  return { kind: 'exact', value, negativeZero: negative && num === 0n };
}
