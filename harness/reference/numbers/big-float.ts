import { bitLength } from './bit-length';

const scratch = new Float64Array(1);
const words = new Uint32Array(scratch.buffer);
const HIGH = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1 ? 1 : 0;
const LOW = 1 - HIGH;

/** Kind of a {@link BigFloat}: a finite number (zero included), an infinity, or NaN. */
type Kind = 0 | 1 | 2;
const FINITE: Kind = 0;
const INFINITE: Kind = 1;
const NAN: Kind = 2;

/**
 * A binary floating-point number of unbounded precision: (−1)^neg · m · 2^e with a
 * bigint mantissa, plus IEEE 754 signed zeros, infinities and NaN.
 *
 * `add`, `sub` and `mul` are exact (the mantissa grows as needed), with IEEE 754
 * round-to-nearest rules for the sign of an exact zero (x − x = +0, −0 + −0 = −0).
 * `div` and `sqrt` truncate to a requested number of bits, so their error is below
 * one unit in the last of those bits. `toDouble` rounds to nearest, ties to even,
 * with gradual underflow and overflow to ±∞ exactly as binary64 does.
 *
 * Binary rather than decimal because every input is a double (an exact dyadic
 * rational) and because bigint arithmetic here is far cheaper than decimal.js:
 * a 150-bit multiply and shift measured ~50 ns against ~130 µs for one decimal.js
 * `ln` at 34 digits (docs/conventions.md).
 */
export class BigFloat {
  private constructor(
    readonly kind: Kind,
    readonly neg: boolean,
    readonly m: bigint,
    readonly e: number,
  ) {}

  static readonly ZERO = new BigFloat(FINITE, false, 0n, 0);
  static readonly NEG_ZERO = new BigFloat(FINITE, true, 0n, 0);
  static readonly ONE = new BigFloat(FINITE, false, 1n, 0);
  static readonly INF = new BigFloat(INFINITE, false, 0n, 0);
  static readonly NEG_INF = new BigFloat(INFINITE, true, 0n, 0);
  static readonly NAN = new BigFloat(NAN, false, 0n, 0);

  /** The value (−1)^neg · m · 2^e; m must be non-negative. */
  static of(neg: boolean, m: bigint, e: number): BigFloat {
    if (m === 0n) return neg ? BigFloat.NEG_ZERO : BigFloat.ZERO;
    return new BigFloat(FINITE, neg, m, e);
  }

  /** A signed bigint times 2^e. */
  static fromBigInt(n: bigint, e = 0): BigFloat {
    return n < 0n ? BigFloat.of(true, -n, e) : BigFloat.of(false, n, e);
  }

  static zero(neg: boolean): BigFloat {
    return neg ? BigFloat.NEG_ZERO : BigFloat.ZERO;
  }

  static infinity(neg: boolean): BigFloat {
    return neg ? BigFloat.NEG_INF : BigFloat.INF;
  }

  /** The exact value of a double, sign of zero included. */
  static fromDouble(x: number): BigFloat {
    if (x !== x) return BigFloat.NAN;
    if (x === Infinity) return BigFloat.INF;
    if (x === -Infinity) return BigFloat.NEG_INF;
    if (x === 0) return Object.is(x, -0) ? BigFloat.NEG_ZERO : BigFloat.ZERO;
    scratch[0] = x;
    const hi = words[HIGH] as number;
    const lo = words[LOW] as number;
    const biased = (hi >>> 20) & 0x7ff;
    const fraction = (hi & 0xfffff) * 4294967296 + lo;
    const neg = hi >>> 31 === 1;
    if (biased === 0) return new BigFloat(FINITE, neg, BigInt(fraction), -1074);
    return new BigFloat(FINITE, neg, BigInt(fraction + 4503599627370496), biased - 1075);
  }

  isFinite(): boolean {
    return this.kind === FINITE;
  }

  isInfinite(): boolean {
    return this.kind === INFINITE;
  }

  isNaN(): boolean {
    return this.kind === NAN;
  }

  isZero(): boolean {
    return this.kind === FINITE && this.m === 0n;
  }

  /** Sign bit, as IEEE 754 signbit: true for −0 and negative values. */
  signbit(): boolean {
    return this.neg;
  }

  /** Smallest E with |x| < 2^E; −Infinity for zero. */
  exponent(): number {
    if (this.m === 0n) return this.kind === FINITE ? -Infinity : Infinity;
    return this.e + bitLength(this.m);
  }

  negate(): BigFloat {
    if (this.kind === NAN) return this;
    return new BigFloat(this.kind, !this.neg, this.m, this.e);
  }

  abs(): BigFloat {
    return this.neg ? this.negate() : this;
  }

  withSign(neg: boolean): BigFloat {
    return this.neg === neg || this.kind === NAN ? this : this.negate();
  }

  add(b: BigFloat): BigFloat {
    if (this.kind !== FINITE || b.kind !== FINITE) {
      if (this.kind === NAN || b.kind === NAN) return BigFloat.NAN;
      if (this.kind === INFINITE && b.kind === INFINITE) return this.neg === b.neg ? this : BigFloat.NAN;
      return this.kind === INFINITE ? this : b;
    }
    if (this.m === 0n) {
      if (b.m === 0n) return this.neg && b.neg ? BigFloat.NEG_ZERO : BigFloat.ZERO;
      return b;
    }
    if (b.m === 0n) return this;
    let ma = this.m;
    let mb = b.m;
    let e = this.e;
    if (this.e > b.e) ma <<= BigInt(this.e - b.e);
    if (b.e > this.e) {
      mb <<= BigInt(b.e - this.e);
    } else {
      e = b.e;
    }
    const sum = (this.neg ? -ma : ma) + (b.neg ? -mb : mb);
    return BigFloat.fromBigInt(sum, e);
  }

  sub(b: BigFloat): BigFloat {
    return this.add(b.negate());
  }

  mul(b: BigFloat): BigFloat {
    const neg = this.neg !== b.neg;
    if (this.kind !== FINITE || b.kind !== FINITE) {
      if (this.kind === NAN || b.kind === NAN) return BigFloat.NAN;
      if (this.isZero() || b.isZero()) return BigFloat.NAN;
      return BigFloat.infinity(neg);
    }
    if (this.m === 0n || b.m === 0n) return BigFloat.zero(neg);
    return new BigFloat(FINITE, neg, this.m * b.m, this.e + b.e);
  }

  /** Exact multiplication by 2^k. */
  scale(k: number): BigFloat {
    if (this.kind !== FINITE || this.m === 0n) return this;
    return new BigFloat(FINITE, this.neg, this.m, this.e + k);
  }

  /** Truncates the mantissa to at most `bits` bits (error below one unit in the last kept bit). */
  truncate(bits: number): BigFloat {
    if (this.kind !== FINITE || this.m === 0n) return this;
    const drop = bitLength(this.m) - bits;
    if (drop <= 0) return this;
    return new BigFloat(FINITE, this.neg, this.m >> BigInt(drop), this.e + drop);
  }

  /** Quotient truncated to at least `bits` correct leading bits; IEEE rules for zeros and infinities. */
  div(b: BigFloat, bits: number): BigFloat {
    const neg = this.neg !== b.neg;
    if (this.kind !== FINITE || b.kind !== FINITE) {
      if (this.kind === NAN || b.kind === NAN) return BigFloat.NAN;
      if (this.kind === INFINITE) return b.kind === INFINITE ? BigFloat.NAN : BigFloat.infinity(neg);
      return BigFloat.zero(neg);
    }
    if (b.m === 0n) return this.m === 0n ? BigFloat.NAN : BigFloat.infinity(neg);
    if (this.m === 0n) return BigFloat.zero(neg);
    const shift = Math.max(0, bits + 1 + bitLength(b.m) - bitLength(this.m));
    const q = (this.m << BigInt(shift)) / b.m;
    return new BigFloat(FINITE, neg, q, this.e - b.e - shift);
  }

  /** Square root truncated to at least `bits` correct bits; sqrt(−0) = −0. */
  sqrt(bits: number): BigFloat {
    if (this.kind === NAN || (this.neg && this.m !== 0n)) return BigFloat.NAN;
    if (this.kind === INFINITE || this.m === 0n) return this;
    let shift = Math.max(0, 2 * bits + 2 - bitLength(this.m));
    if ((this.e - shift) % 2 !== 0) shift += 1;
    const root = integerSqrt(this.m << BigInt(shift));
    return new BigFloat(FINITE, false, root, (this.e - shift) / 2);
  }

  /** −1, 0 or 1 comparing |this| with |b| (finite values). */
  compareAbs(b: BigFloat): number {
    if (this.m === 0n) return b.m === 0n ? 0 : -1;
    if (b.m === 0n) return 1;
    const ea = this.exponent();
    const eb = b.exponent();
    if (ea !== eb) return ea < eb ? -1 : 1;
    const e = Math.min(this.e, b.e);
    const ma = this.m << BigInt(this.e - e);
    const mb = b.m << BigInt(b.e - e);
    return ma < mb ? -1 : ma > mb ? 1 : 0;
  }

  /** −1, 0 or 1 comparing values (finite; −0 equals +0). */
  compare(b: BigFloat): number {
    const za = this.m === 0n;
    const zb = b.m === 0n;
    if (za && zb) return 0;
    const sa = za ? 0 : this.neg ? -1 : 1;
    const sb = zb ? 0 : b.neg ? -1 : 1;
    if (sa !== sb) return sa < sb ? -1 : 1;
    const c = this.compareAbs(b);
    return sa < 0 ? -c : c;
  }

  /** trunc(x · 2^P) as a signed bigint (fixed point with P fraction bits). */
  toFixed(P: number): bigint {
    if (this.m === 0n) return 0n;
    const shift = this.e + P;
    const v = shift >= 0 ? this.m << BigInt(shift) : this.m >> BigInt(-shift);
    return this.neg ? -v : v;
  }

  /** Whether the value is an integer (finite values). */
  isInteger(): boolean {
    if (this.m === 0n || this.e >= 0) return true;
    return (this.m & ((1n << BigInt(-this.e)) - 1n)) === 0n;
  }

  /** The correctly rounded binary64: to nearest, ties to even, gradual underflow, overflow to ±∞. */
  toDouble(): number {
    if (this.kind === NAN) return NaN;
    if (this.kind === INFINITE) return this.neg ? -Infinity : Infinity;
    if (this.m === 0n) return this.neg ? -0 : 0;
    const top = this.e + bitLength(this.m);
    if (top > 1025) return this.neg ? -Infinity : Infinity;
    // Below half the least subnormal (|x| < 2^−1075) the rounding is a signed zero; shifting out
    // the bits as below would build a 2^(−e)-bit integer for e^x's stand-in 2^(−2^42).
    if (top < -1075) return this.neg ? -0 : 0;
    const lsb = Math.max(top - 53, -1074);
    let q: bigint;
    if (lsb <= this.e) {
      q = this.m << BigInt(this.e - lsb);
    } else {
      const drop = BigInt(lsb - this.e);
      q = this.m >> drop;
      const rest = this.m - (q << drop);
      const half = 1n << (drop - 1n);
      if (rest > half || (rest === half && (q & 1n) === 1n)) q += 1n;
    }
    const magnitude = Number(q) * 2 ** lsb;
    return this.neg ? -magnitude : magnitude;
  }

  /** Decimal string with at most `digits` significant digits (rounded half-up on the digit string), trailing zeros dropped. */
  toDecimal(digits: number): string {
    if (this.kind === NAN) return 'nan';
    if (this.kind === INFINITE) return this.neg ? '-inf' : 'inf';
    if (this.m === 0n) return this.neg ? '-0' : '0';
    const top = this.exponent();
    let k = Math.floor((top - 1) * LOG10_OF_2) - digits + 1;
    let q = scaledQuotient(this.m, this.e, k);
    if (q >= POW10(digits + 1)) {
      // One digit too many: trunc(trunc(v)/10) = trunc(v/10) for v ≥ 0, without a second quotient.
      k += 1;
      q /= 10n;
    }
    let rounded = (q + 5n) / 10n;
    let exp10 = k;
    if (rounded >= POW10(digits)) {
      rounded /= 10n;
      exp10 += 1;
    }
    let text = rounded.toString();
    while (text.length > 1 && text.endsWith('0')) {
      text = text.slice(0, -1);
      exp10 += 1;
    }
    return (this.neg ? '-' : '') + placeDecimalPoint(text, exp10);
  }
}

const LOG10_OF_2 = Math.log10(2);
const powers10: bigint[] = [1n];
function POW10(n: number): bigint {
  for (let i = powers10.length; i <= n; i++) powers10.push((powers10[i - 1] as bigint) * 10n);
  return powers10[n] as bigint;
}

/**
 * trunc(m · 2^e / 10^(k−1)): one more digit than wanted, for rounding. When the divisor is a
 * power of two alone (e < 0 and k ≤ 1: every value below 10^40 printed to 40 digits) the
 * quotient is a shift, as exact as the division it replaces and cheaper.
 */
function scaledQuotient(m: bigint, e: number, k: number): bigint {
  const kk = k - 1;
  if (Math.abs(kk) > EXACT_POWERS) return roughScaledQuotient(m, e, kk);
  let num = m;
  let den = 1n;
  if (kk < 0) num *= POW10(-kk);
  if (e < 0 && kk <= 0) return num >> BigInt(-e);
  if (e >= 0) num <<= BigInt(e);
  else den <<= BigInt(-e);
  if (kk >= 0) den *= POW10(kk);
  return num / den;
}

/**
 * Past 10^±400 (beyond every double and its 40 digits) the power of ten is formed to
 * ROUGH_BITS bits instead of exactly. Exact powers cost O(n²) bits when cached (a value near
 * 1e−184000, pow(z, 2049) at |z| ≈ 1e−90, ran the process out of memory) and 45 ms a value near
 * 1e−285613 when not; rounded to 1,024 bits by at most 2·40 truncations the quotient's relative
 * error is below 2^−1,000, far below its last digit (at most 201 digits, 668 bits).
 */
const EXACT_POWERS = 400;
const ROUGH_BITS = 1024;

/** trunc(m · 2^e / 10^kk) for a large |kk|, with 10^|kk| to {@link ROUGH_BITS} bits. */
function roughScaledQuotient(m: bigint, e: number, kk: number): bigint {
  let [tm, te] = [1n, 0];
  let [bm, be] = [10n, 0];
  const keep = (x: bigint, xe: number): [bigint, number] => {
    const drop = bitLength(x) - ROUGH_BITS;
    return drop > 0 ? [x >> BigInt(drop), xe + drop] : [x, xe];
  };
  for (let n = Math.abs(kk); n > 0; n = Math.floor(n / 2)) {
    if (n % 2 === 1) [tm, te] = keep(tm * bm, te + be);
    if (n > 1) [bm, be] = keep(bm * bm, 2 * be);
  }
  if (kk > 0) {
    const shift = e - te;
    return shift >= 0 ? (m << BigInt(shift)) / tm : m / (tm << BigInt(-shift));
  }
  const shift = e + te;
  const product = m * tm;
  return shift >= 0 ? product << BigInt(shift) : product >> BigInt(-shift);
}

/** `digits` · 10^exp10 written plainly for moderate exponents, else as d.ddde±n. */
function placeDecimalPoint(digits: string, exp10: number): string {
  const pointAt = digits.length + exp10;
  if (exp10 >= 0 && pointAt <= 21) return digits + '0'.repeat(exp10);
  if (exp10 < 0 && pointAt > 0) return `${digits.slice(0, pointAt)}.${digits.slice(pointAt)}`;
  if (pointAt <= 0 && pointAt > -6) return `0.${'0'.repeat(-pointAt)}${digits}`;
  const sci = pointAt - 1;
  const mantissa = digits.length > 1 ? `${digits[0]}.${digits.slice(1)}` : digits;
  return `${mantissa}e${sci >= 0 ? '+' : ''}${sci}`;
}

/**
 * floor(sqrt(n)) by Newton's iteration from a double-double estimate. From 2^106 on, the root of
 * n's top 105–106 bits is taken in double-double (one correction of Math.sqrt), good to ~2^−96
 * relative, so a root of up to 192 bits needs one bigint division and a square to settle. The
 * double estimate this replaced (~2^−40) needed four divisions (three steps and one to see no
 * change): integerSqrt was 12% of the 40-digit bench, the largest single cost.
 */
function integerSqrt(n: bigint): bigint {
  if (n < 4503599627370496n) {
    let r = BigInt(Math.floor(Math.sqrt(Number(n))));
    while (r * r > n) r -= 1n;
    while ((r + 1n) * (r + 1n) <= n) r += 1n;
    return r;
  }
  const bits = bitLength(n);
  let x: bigint;
  let precision: number;
  if (bits <= 106) {
    const estimate = Math.sqrt(Number(n));
    x = BigInt(Math.ceil(estimate * (1 + 2 ** -40))) + 1n;
    precision = 40;
  } else {
    const drop = (bits - 105) & ~1;
    const top = n >> BigInt(drop);
    const hi = Number(top);
    const lo = Number(top - BigInt(hi));
    const s = Math.sqrt(hi);
    const c = (hi - s * s - squareError(s) + lo) / (2 * s);
    const half = drop / 2;
    x = (BigInt(s) << BigInt(half)) + (BigInt(Math.trunc(c * 2 ** 53)) << BigInt(half)) / 9007199254740992n;
    precision = 96;
  }
  // Each step from above at least doubles the correct bits; the first lands at or above floor(√n).
  const rootBits = (bits >> 1) + 2;
  do {
    x = (x + n / x) >> 1n;
    precision *= 2;
  } while (precision < rootBits + 4);
  while (x * x > n) x -= 1n;
  return x;
}

/** s·s − fl(s·s), exactly, by Veltkamp's split (Dekker). */
function squareError(s: number): number {
  const t = 134217729 * s;
  const a = t - (t - s);
  const b = s - a;
  return a * a - s * s + 2 * a * b + b * b;
}
