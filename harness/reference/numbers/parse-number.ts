import { BigFloat } from './big-float';
import { Rational } from './rational';

/** A parsed wire number: special values stay IEEE, everything else is exact. */
export type ParsedNumber =
  | { kind: 'special'; value: BigFloat }
  | { kind: 'exact'; value: Rational; negativeZero: boolean };

const DECIMAL = /^([+-]?)(\d+\.?\d*|\.\d+)(?:[eE]([+-]?\d+))?$/;
const HEX = /^([+-]?)0[xX]([0-9a-fA-F]+\.?[0-9a-fA-F]*|\.[0-9a-fA-F]+)(?:[pP]([+-]?\d+))?$/;
const RATIO = /^([+-]?\d+)\/(\d+)$/;
const MAX_EXPONENT_DIGITS = 6;

/**
 * Reads a number in the wire format of DESIGN.md §5 exactly: decimal strings,
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
  if (dec) {
    const [, sign, body, exp] = dec as unknown as [string, string, string, string | undefined];
    if (exp !== undefined && exp.replace(/^[+-]/, '').length > MAX_EXPONENT_DIGITS) {
      throw new RangeError(`"${text}" has an exponent out of range`);
    }
    const [whole = '', frac = ''] = body.split('.');
    let num = BigInt((whole + frac).replace(/^0+(?=\d)/, '') || '0');
    const e10 = Number(exp ?? '0') - frac.length;
    let den = 1n;
    if (e10 >= 0) num *= 10n ** BigInt(e10);
    else den = 10n ** BigInt(-e10);
    const negative = sign === '-';
    return { kind: 'exact', value: new Rational(negative ? -num : num, den), negativeZero: negative && num === 0n };
  }
  const hex = HEX.exec(t);
  if (hex) {
    const [, sign, body, exp] = hex as unknown as [string, string, string, string | undefined];
    if (exp !== undefined && exp.replace(/^[+-]/, '').length > MAX_EXPONENT_DIGITS) {
      throw new RangeError(`"${text}" has an exponent out of range`);
    }
    const [whole = '', frac = ''] = body.split('.');
    const num = BigInt('0x' + ((whole + frac).replace(/^0+(?=.)/, '') || '0'));
    const e2 = Number(exp ?? '0') - 4 * frac.length;
    const negative = sign === '-';
    const signed = negative ? -num : num;
    const value = e2 >= 0 ? new Rational(signed << BigInt(e2)) : new Rational(signed, 1n << BigInt(-e2));
    return { kind: 'exact', value, negativeZero: negative && num === 0n };
  }
  throw new RangeError(`"${text}" is not a number (expected decimal, hex float, p/q, inf, -inf or nan)`);
}
