import { referenceRequest } from '../../shared/schemas/reference-request';
import type { ReferenceAnswer } from '../../shared/reference-answer';
import type { ReferenceFlag } from '../../shared/reference-flag';
import type { Approximation } from './complex/approximation';
import { BigComplex } from './complex/big-complex';
import type { PowerExponent } from './complex/power-exponent';
import { describeRequestError } from './describe-request-error';
import { BigFloat } from './numbers/big-float';
import { bitLength } from './numbers/bit-length';
import { formatDouble } from './numbers/format-double';
import { parseDouble } from './numbers/parse-double';
import { parseNumber } from './numbers/parse-number';
import { Rational } from './numbers/rational';
import { principalValue } from './principal-value';

const RATIO = /^\s*[+-]?\d+\/\d+\s*$/;
const HEX = /^\s*[+-]?0x/i;
const DEFAULT_DIGITS = 40;
/**
 * Beyond 2^±2^20 (about 10^±315,653) a part's digits are not printed: the "value" part is then its
 * double (±inf or a signed zero), and "flags" says it overflowed or underflowed. Printing 40 digits
 * of 2^(2^42), the stand-in for e^x with |x| > 2^40, would need a 2^42-bit integer.
 */
const PRINTABLE_EXPONENT = 2 ** 20;
/** A w past 2^1024, beyond every double, is refused. */
const MAX_EXPONENT_BITS = 1024;
/** |x| < 2^−1022, below the smallest normal double, is exponent() ≤ −1022. */
const SMALLEST_NORMAL_EXPONENT = -1022;

/** A request field whose number cannot be taken as written. */
class FieldError extends Error {}

/**
 * The answer to one `reference` request (docs/suite-format.md, "The reference request"): the
 * principal value to 40 significant digits, the correctly rounded double and the IEEE 754
 * exceptions its rounding raised, or `{error}` naming the field at fault.
 *
 * What a number means here:
 * - z is a library's input. A decimal names the nearest binary64 (ties to even), as a library
 *   parsing it would get; a ratio p/q or a hex float is taken exactly, and must therefore be a
 *   double ("-9/4", "0x1p-1074"): one that is not ("1/3", "0x1p+999999") is refused, naming the
 *   field, rather than rounded.
 * - w describes the mathematics: a ratio p/q is that exact rational, in "w": "1/3" and in
 *   "w": {"re": "1/3", "im": "0"} alike (a zero imaginary part, of either sign, makes w real),
 *   so both spellings give the same bits. A decimal w, like a decimal z, names its double.
 */
export function answerReference(input: unknown): ReferenceAnswer {
  const parsed = referenceRequest.safeParse(input);
  if (!parsed.success) return describeRequestError(parsed.error);
  const req = parsed.data;
  try {
    const z = new BigComplex(basePart(req.z.re, 'z.re'), basePart(req.z.im, 'z.im'));
    let w: PowerExponent | undefined;
    if (typeof req.w === 'string') {
      const part = exponentPart(req.w, 'w');
      w =
        part instanceof BigFloat
          ? { kind: 'complex', value: new BigComplex(part, BigFloat.ZERO) }
          : { kind: 'rational', value: part };
    } else if (req.w) {
      w = complexExponent(req.w.re, req.w.im);
    }
    if ((req.fn === 'pow') !== (w !== undefined))
      return { error: req.fn === 'pow' ? 'pow needs "w"' : `"w" is only for pow` };
    if ((req.fn === 'nthroot') !== (req.n !== undefined)) {
      return { error: req.fn === 'nthroot' ? 'nthroot needs "n"' : `"n" is only for nthroot` };
    }
    const digits = req.digits ?? DEFAULT_DIGITS;
    const r = principalValue(
      { fn: req.fn, z, w, n: req.n === undefined ? undefined : Number(req.n), convention: req.convention },
      { double: true, digits },
    );
    const [dre, dim] = r.double;
    const answer: ReferenceAnswer = {
      value: { re: printed(r.approximation.re, dre, digits), im: printed(r.approximation.im, dim, digits) },
      double: { re: formatDouble(dre), im: formatDouble(dim) },
    };
    const flags = raisedFlags(r.approximation, r.double);
    if (flags.length > 0) answer.flags = flags;
    if (!r.settled) answer.warning = 'precision cap reached before the rounding was decided';
    return answer;
  } catch (e) {
    return { error: e instanceof Error ? e.message : String(e) };
  }
}

/**
 * A part of z: a decimal's nearest double; a ratio or a hex float exactly, when it is a double,
 * else refused naming the field. z is a library's input, and a value no double holds (1/3,
 * 0x1p+999999) would be neither what a library receives nor within the range the engine is
 * checked over.
 */
function basePart(text: string, field: string): BigFloat {
  if (!RATIO.test(text) && !HEX.test(text)) return BigFloat.fromDouble(parseDouble(text));
  const exact = binaryFraction(text, exactRatio(text));
  const double = exact?.toDouble() ?? NaN;
  if (exact && Number.isFinite(double) && BigFloat.fromDouble(double).compare(exact) === 0) return exact;
  throw new FieldError(
    `${field} "${text.trim()}" is not exactly a double: z is a library's input, taken exactly when written as p/q or a hex float, so it must be one; write a decimal for the nearest double`,
  );
}

/** A complex w: real when its imaginary part is zero; its ratios kept exact. */
function complexExponent(reText: string, imText: string): PowerExponent {
  const re = exponentPart(reText, 'w.re');
  const im = exponentPart(imText, 'w.im');
  if (im.isZero() && !(re instanceof BigFloat)) return { kind: 'rational', value: re };
  if (re instanceof BigFloat && im instanceof BigFloat) return { kind: 'complex', value: new BigComplex(re, im) };
  const rational = (p: BigFloat | Rational) => (p instanceof BigFloat ? Rational.fromBigFloat(p) : p);
  return { kind: 'gaussian', re: rational(re), im: rational(im) };
}

/**
 * A part of w: a decimal's double; a hex float or a binary ratio exactly as a BigFloat; any other
 * ratio exactly as a Rational. Refused past 2^1024 in magnitude, beyond every double: the working
 * precision grows with log2 |w| (0x1p+999999 would ask for a million bits).
 */
function exponentPart(text: string, field: string): BigFloat | Rational {
  if (!RATIO.test(text) && !HEX.test(text)) return BigFloat.fromDouble(parseDouble(text));
  const ratio = exactRatio(text);
  if (bitLength(abs(ratio.num)) - bitLength(ratio.den) > MAX_EXPONENT_BITS) {
    throw new FieldError(`${field} "${text.trim()}" is larger than any double: write at most about 1.8e308`);
  }
  return binaryFraction(text, ratio) ?? ratio;
}

/** num/den exactly as a BigFloat when den is a power of two ("-0/4" keeps its sign), else null. */
function binaryFraction(text: string, r: Rational): BigFloat | null {
  if ((r.den & (r.den - 1n)) !== 0n) return null;
  if (r.isZero()) return BigFloat.zero(text.trim().startsWith('-'));
  return r.toBigFloat(0);
}

/** The exact value of a ratio or a hex float. */
function exactRatio(text: string): Rational {
  const p = parseNumber(text);
  if (p.kind !== 'exact') throw new FieldError(`"${text}" is not a ratio`);
  return p.value;
}

/** The part to `digits` digits, or its double beyond {@link PRINTABLE_EXPONENT}. */
function printed(part: BigFloat, double: number, digits: number): string {
  if (part.isFinite() && !part.isZero() && Math.abs(part.exponent()) > PRINTABLE_EXPONENT) return formatDouble(double);
  return part.toDecimal(digits);
}

/**
 * IEEE 754-2019 §7.4: overflow when a finite value rounds to ±∞ (round to nearest); §7.5 with
 * default handling: underflow when a non-zero value below 2^−1022 in magnitude is not exactly
 * a double (it is tiny and inexact). A part whose error bound is zero is exact.
 */
function raisedFlags(a: Approximation, double: [number, number]): ReferenceFlag[] {
  const flags = new Set<ReferenceFlag>();
  const parts: [BigFloat, number, number][] = [
    [a.re, a.reErr, double[0]],
    [a.im, a.imErr, double[1]],
  ];
  for (const [value, err, d] of parts) {
    if (!value.isFinite() || value.isZero()) continue;
    if (!Number.isFinite(d)) flags.add('overflow');
    else if (value.exponent() <= SMALLEST_NORMAL_EXPONENT) {
      const exact = err === -Infinity && value.compare(BigFloat.fromDouble(d)) === 0;
      if (!exact) flags.add('underflow');
    }
  }
  return [...flags].sort();
}

function abs(n: bigint): bigint {
  return n < 0n ? -n : n;
}
