import { referenceRequest } from '../../shared/schemas/reference-request';
import type { ReferenceAnswer } from '../../shared/reference-answer';
import type { ReferenceFlag } from '../../shared/reference-flag';
import type { Approximation } from './complex/approximation';
import { BigComplex } from './complex/big-complex';
import type { PowerExponent } from './complex/power-exponent';
import { describeRequestError } from './describe-request-error';
import { BigFloat } from './numbers/big-float';
import { formatDouble } from './numbers/format-double';
import { parseDouble } from './numbers/parse-double';
import { parseNumber } from './numbers/parse-number';
import { Rational } from './numbers/rational';
import { principalValue } from './principal-value';

const RATIO = /^\s*[+-]?\d+\/\d+\s*$/;
const DEFAULT_DIGITS = 40;
/**
 * Beyond 2^±2^20 (about 10^±315,653) a part's digits are not printed: the "value" part is then its
 * double (±inf or a signed zero), and "flags" says it overflowed or underflowed. Printing 40 digits
 * of 2^(2^42), the stand-in for e^x with |x| > 2^40, would need a 2^42-bit integer.
 */
const PRINTABLE_EXPONENT = 2 ** 20;
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
 *   parsing it would get; a hex float and a ratio p/q whose q is a power of two are taken exactly,
 *   whatever their length. A ratio with any other q has no exact binary value and is refused,
 *   naming the field, rather than rounded.
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
      w = RATIO.test(req.w)
        ? { kind: 'rational', value: exactRatio(req.w) }
        : { kind: 'complex', value: BigComplex.fromDoubles(parseDouble(req.w), 0) };
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

/** A part of z: a decimal's nearest double, a hex float or a binary ratio exactly, else refused. */
function basePart(text: string, field: string): BigFloat {
  if (!RATIO.test(text)) return BigFloat.fromDouble(parseDouble(text));
  const exact = binaryFraction(text, exactRatio(text));
  if (exact) return exact;
  throw new FieldError(
    `${field} "${text.trim()}" has no exact binary value: z is taken exactly, and p/q is only exact when q is a power of two; write a decimal for the nearest double`,
  );
}

/** A complex w: real when its imaginary part is zero; its ratios kept exact. */
function complexExponent(reText: string, imText: string): PowerExponent {
  const re = exponentPart(reText);
  const im = exponentPart(imText);
  const isZero = (p: BigFloat | Rational) => (p instanceof BigFloat ? p.isZero() : p.isZero());
  if (isZero(im) && !(re instanceof BigFloat)) return { kind: 'rational', value: re };
  if (re instanceof BigFloat && im instanceof BigFloat) return { kind: 'complex', value: new BigComplex(re, im) };
  const rational = (p: BigFloat | Rational) => (p instanceof BigFloat ? Rational.fromBigFloat(p) : p);
  return { kind: 'gaussian', re: rational(re), im: rational(im) };
}

/** A part of w: a double, a binary ratio as a BigFloat (exact), or any other ratio as a Rational. */
function exponentPart(text: string): BigFloat | Rational {
  if (!RATIO.test(text)) return BigFloat.fromDouble(parseDouble(text));
  const ratio = exactRatio(text);
  return binaryFraction(text, ratio) ?? ratio;
}

/** num/den exactly as a BigFloat when den is a power of two ("-0/4" keeps its sign), else null. */
function binaryFraction(text: string, r: Rational): BigFloat | null {
  if ((r.den & (r.den - 1n)) !== 0n) return null;
  if (r.isZero()) return BigFloat.zero(text.trim().startsWith('-'));
  return r.toBigFloat(0);
}

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
