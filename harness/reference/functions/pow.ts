import { Approximation } from '../complex/approximation';
import { BigComplex } from '../complex/big-complex';
import type { PowerExponent } from '../complex/power-exponent';
import { BigFloat } from '../numbers/big-float';
import { exactPowerMagnitude } from '../complex/exact-power-magnitude';
import { bitLength } from '../numbers/bit-length';
import { Rational } from '../numbers/rational';
import { FixedTables } from '../real/fixed-tables';
import { realAtan2 } from '../real/real-atan2';
import { realExp } from '../real/real-exp';
import { realSinCos } from '../real/real-sin-cos';
import { exp } from './exp';
import { log } from './log';

/** Integer exponents up to this size are done by exact repeated squaring. */
const MAX_EXACT_INTEGER = 1024;

/**
 * Principal power z^w = exp(w · Log z) (DLMF 4.2.26), the definition ISO/IEC 9899:2011
 * G.6.4.1 allows for cpow (it gives cpow no special-value table of its own).
 *
 * - Range: for real w, −π|w| < arg ≤ π|w| (ccw) or −π|w| ≤ arg ≤ π|w| (signed-zero).
 * - Cut: (−∞, 0] for non-integer w (none for integer w); branch point 0.
 * - signed-zero: on the cut the sign of Im z picks the side (via Log), (−4 ± 0i)^(1/2) = 0 ± 2i.
 * - counter-clockwise: the cut belongs to the upper side, (−4)^(1/2) = 2i. They differ at
 *   x − 0i, x < 0.
 *
 * Choices where the standards leave it open, all ours: an integer w is done by exact
 * repeated multiplication, so zero signs are those IEEE products give; z^0 = 1 + 0i;
 * 0^w = +0 ± 0i (the sign of Im z) for Re w > 0, +∞ + 0i for Re w < 0, NaN + iNaN for
 * Re w = 0 ≠ Im w; with an infinite or NaN operand, cexp(w·clog z) evaluated formally.
 *
 * Exact parts, proved rather than approached forever by the rounding loop:
 * - Angles. When z lies on an axis or a diagonal and w is real, arg z^w = w·kπ/4 is a rational
 *   multiple of π; so is it for any complex w at z = ±1, ±i (ln|z| = 0, arg z^w = Re w·kπ/2).
 *   A part whose cos or sin is 0 there is an exact zero: (−4)^(1/2) = 0 + 2i, and
 *   (−1)^(½+i) = 0 + e^−π·i, which escalated to the 16,384-bit cap before. Its sign, our rule
 *   (cpow has no Annex G table): +0, the sign cos and sin take at those angles; at angle ±0
 *   (z on the positive real axis) the zero is the IEEE product sign of w and Im z, as w·Log z
 *   computed in IEEE arithmetic gives.
 * - Magnitudes. On an axis with w = p/q, |z|^w is exact when |z| is a q-th power of a binary
 *   fraction ({@link exactPowerMagnitude}); with the angle's cos or sin in {0, ±½, ±1} that part
 *   is exact too: (262143²)^(3/2) = 262143³, a midpoint between two doubles, rounds to even.
 * - Bounds. For real w and a small angle each part is bounded relative to itself, so a tiny
 *   part beside a large one (1 − 4.2e−724i) settles at the first precision.
 *
 * Range: every finite z and w. The working precision is sized from exponents (|z| up to 2^1024,
 * a p/q of any length), and e^(Re w·Log z) beyond binary64 saturates (see realExp) so the parts
 * round to ±∞ or a signed zero as IEEE 754 says.
 */
export function pow(z: BigComplex, w: PowerExponent, bits: number): Approximation {
  const exponent = asRational(w);
  if (exponent && exponent.isInteger() && abs(exponent.num) <= MAX_EXACT_INTEGER && z.isFinite()) {
    return integerPower(z, Number(exponent.num), bits);
  }
  if (!z.isFinite() || (w.kind === 'complex' && !w.value.isFinite())) return formal(z, w, bits);
  if (z.isZero()) return zeroBase(z, exponent ? exponent.compare(Rational.ZERO) : realSign(w), bits);
  // How many bits |w · Log z| has before the point, from exponents alone: a double's hypot or
  // log overflowed at |z| near 2^1024 and at a p/q with a long numerator ("The number Infinity
  // cannot be converted to a BigInt"). |Log z| ≤ (|top| + 1)·ln 2 + π for 2^(top−1) ≤ |z| < 2^(top+1).
  const top = Math.max(z.re.exponent(), z.im.exponent());
  const logBits = Math.log2((Math.abs(top) + 1) * Math.LN2 + 4);
  const scale = Math.max(0, Math.ceil(exponentBits(w, exponent) + logBits) + 1);
  const F = bits + 24 + scale;
  const L = log.evaluate(z, F);
  const wr = exponent;
  const wc = wr ? null : complexParts(w, F + 8);
  let Pr: BigFloat;
  let Pi: BigFloat;
  let rotation: number | null = null;
  if (wr) {
    const r = wr.toBigFloat(F + 8);
    Pr = r.mul(L.re).truncate(F + 8);
    // Arg z = q·π/2 + rest: w·q/2 turns of π are reduced mod 2 exactly, and only w·rest is
    // rounded. (−8.6e−309 − 1.8e171i)^−MAX has w·Arg z = an even multiple of π + 8.5e−172: taken
    // whole, the angle's error swamped that and the rounding loop climbed to 2,272 bits.
    const [q, rest] = quarterTurns(z, F + 8);
    const turns = modTwo(wr.mul(new Rational(BigInt(q), 2n)));
    const spin = r.mul(rest).truncate(F + 8);
    // Whole quarter turns are left out of the angle and applied exactly to its sine and cosine.
    const quarters = turns.mul(new Rational(2n));
    if (quarters.isInteger()) rotation = Number(quarters.num);
    Pi =
      rotation !== null
        ? spin
        : piTimes(turns, F + 8)
            .add(spin)
            .truncate(F + 8);
  } else {
    const [cr, ci] = wc as [BigFloat, BigFloat];
    Pr = cr
      .mul(L.re)
      .sub(ci.mul(L.im))
      .truncate(F + 8);
    Pi = cr
      .mul(L.im)
      .add(ci.mul(L.re))
      .truncate(F + 8);
  }
  const eighthTurns = specialAngle(z);
  if (wr && eighthTurns !== null && eighthTurns % 2 === 0) {
    const exact = exactPowerMagnitude((z.im.isZero() ? z.re : z.im).abs(), wr);
    if (exact) return exactMagnitudePower(exact, wr.mul(new Rational(BigInt(eighthTurns), 4n)), wr, z, F);
  }
  const M = realExp(Pr, F);
  if (eighthTurns !== null && (wr || (eighthTurns !== 0 && isUnitAxisPoint(z)))) {
    // arg z^w = Re w · arg z, a rational multiple of π: exactly so when w is real, and when z is
    // ±1 or ±i (ln|z| = 0, so Im(w · Log z) = Re w · arg z); see exactAngle.
    const re = wr ?? realPart(w);
    const [s, c] = exactAngle(re.mul(new Rational(BigInt(eighthTurns), 4n)), re, z, F);
    const err = wr ? null : M.exponent() + scale + 4 - F;
    if (err === null) return Approximation.relative(M.mul(c), M.mul(s), bits);
    const [pr, pi] = [M.mul(c), M.mul(s)];
    return new Approximation(pr, pi, pr.isZero() ? -Infinity : err, pi.isZero() ? -Infinity : err);
  }
  const [s, c] = quarterTurned(realSinCos(Pi, F), rotation ?? 0);
  const re = M.mul(c);
  const im = M.mul(s);
  // For real w, whole quarter turns of π plus an angle Im P = w·rest below 1/2: that angle is a
  // product of relatively accurate factors, so its sine and cosine, and both parts, are relatively
  // accurate too (|P| < 2^scale bounds what Re P's error costs M): each part's bound is relative
  // to itself. Otherwise the angle's error is absolute and bounds both parts by |M|. Bounding a
  // tiny part by |M| had pow(8.1e307 + 1.5e−108i, −2.2e−308) (imaginary part 4.2e−724) go to
  // 4,096 bits and build tables for 1.5 s, and nthroot(−1.58e308 − 2.9e−297i, 2) (real part
  // 3e−451 beside 1.3e154, three quarter turns) climb through seven levels to 2,400 bits (52 ms).
  const relative = rotation !== null && Pi.exponent() < -1;
  const err = (part: BigFloat) => (part.isZero() ? -Infinity : (relative ? part : M).exponent() + scale + 4 - F);
  return new Approximation(re, im, err(re), err(im));
}

function abs(n: bigint): bigint {
  return n < 0n ? -n : n;
}

function asRational(w: PowerExponent): Rational | null {
  if (w.kind === 'rational') return w.value;
  if (w.kind === 'gaussian') return w.im.isZero() ? w.re : null;
  const { re, im } = w.value;
  if (im.isZero() && re.isFinite()) return Rational.fromBigFloat(re);
  return null;
}

/** Re w exactly, for a complex w with finite parts. */
function realPart(w: PowerExponent): Rational {
  if (w.kind === 'rational') return w.value;
  return w.kind === 'gaussian' ? w.re : Rational.fromBigFloat(w.value.re);
}

/** The parts of a complex w: a double's exactly, a non-binary rational's to `bits` bits. */
function complexParts(w: PowerExponent, bits: number): [BigFloat, BigFloat] {
  if (w.kind === 'complex') return [w.value.re, w.value.im];
  if (w.kind === 'gaussian') return [w.re.toBigFloat(bits), w.im.toBigFloat(bits)];
  return [w.value.toBigFloat(bits), BigFloat.ZERO];
}

/** An upper bound on log2 |w| (0 for w = 0), from bit lengths, never overflowing. */
function exponentBits(w: PowerExponent, exponent: Rational | null): number {
  const ratioBits = (r: Rational) => (r.isZero() ? 0 : bitLength(abs(r.num)) - bitLength(r.den) + 1);
  if (exponent) return Math.max(0, ratioBits(exponent));
  if (w.kind === 'gaussian') return Math.max(0, ratioBits(w.re), ratioBits(w.im)) + 1;
  if (w.kind === 'complex') return Math.max(0, w.value.re.exponent(), w.value.im.exponent()) + 1;
  return 0;
}

function realSign(w: PowerExponent): number {
  if (w.kind === 'rational') return w.value.compare(Rational.ZERO);
  if (w.kind === 'gaussian') return w.re.isZero() ? (w.im.isZero() ? 0 : NaN) : w.re.compare(Rational.ZERO);
  if (w.value.re.isZero()) return w.value.im.isZero() ? 0 : NaN;
  return w.value.re.signbit() ? -1 : 1;
}

/**
 * arg z / (π/4) when it is a whole number: z on an axis (0 for x > 0, ±2 for ±iy, ±4 for x < 0,
 * the sign of y) or on a diagonal |x| = |y| (±1, ±3). Off these, arg z is an irrational multiple
 * of π for a z with binary-fraction parts (tan(arg z) = y/x is rational, and the only rational
 * values tan takes at rational multiples of π are 0 and ±1: Niven, Irrational Numbers, 1956,
 * cor. 3.12, from memory).
 */
function specialAngle(z: BigComplex): number | null {
  const down = z.im.signbit();
  if (z.im.isZero()) return z.re.signbit() ? (down ? -4 : 4) : 0;
  if (z.re.isZero()) return down ? -2 : 2;
  if (z.re.compareAbs(z.im) !== 0) return null;
  const turns = z.re.signbit() ? 3 : 1;
  return down ? -turns : turns;
}

/** z = ±1 or ±i, where ln|z| = 0 exactly. */
function isUnitAxisPoint(z: BigComplex): boolean {
  const one = (x: BigFloat) => x.compareAbs(BigFloat.ONE) === 0;
  return (z.im.isZero() && one(z.re)) || (z.re.isZero() && one(z.im));
}

/** [sin, cos] of θ = turns·π for rational `turns`, exact where θ is a multiple of π/2. */
function exactAngle(turns: Rational, w: Rational, z: BigComplex, F: number): [BigFloat, BigFloat] {
  if (turns.isZero()) {
    // θ = w · (±0): IEEE gives the zero the product sign of w and Im z.
    return [BigFloat.zero(w.num < 0n !== z.im.signbit()), BigFloat.ONE];
  }
  const twice = turns.mul(new Rational(2n));
  if (twice.isInteger()) {
    const q = Number(((twice.num % 4n) + 4n) % 4n);
    const sines = [BigFloat.ZERO, BigFloat.ONE, BigFloat.ZERO, BigFloat.ONE.negate()];
    const cosines = [BigFloat.ONE, BigFloat.ZERO, BigFloat.ONE.negate(), BigFloat.ZERO];
    return [sines[q] as BigFloat, cosines[q] as BigFloat];
  }
  const G = F + 16 + Math.max(0, turns.num.toString(2).length - turns.den.toString(2).length);
  return realSinCos(piTimes(turns, G), F);
}

/** turns·π with relative error below 2^−bits. */
function piTimes(turns: Rational, bits: number): BigFloat {
  return BigFloat.fromBigInt(turns.num * FixedTables.pi(bits)).div(
    BigFloat.fromBigInt(turns.den << BigInt(bits)),
    bits,
  );
}

/** [sin, cos] of θ + k·π/2 from [sin θ, cos θ], exactly. */
function quarterTurned([s, c]: [BigFloat, BigFloat], k: number): [BigFloat, BigFloat] {
  if (k === 1) return [c, s.negate()];
  if (k === 2) return [s.negate(), c.negate()];
  if (k === 3) return [c.negate(), s];
  return [s, c];
}

/** t mod 2, in [0, 2). */
function modTwo(t: Rational): Rational {
  const period = 2n * t.den;
  return new Rational(((t.num % period) + period) % period, t.den);
}

/**
 * Arg z = q·π/2 + rest for a non-zero finite z, with q in {−2, −1, 0, 1, 2} and |rest| ≤ π/4
 * to `bits` bits relative: rest is the argument of z turned by −q quarter turns (exactly, by
 * swapping and negating parts), so a z near an axis keeps its small angle whole. Zero signs
 * follow atan2: q = ±2 for x < 0 takes the sign of y, as Arg does on the cut.
 */
function quarterTurns(z: BigComplex, bits: number): [number, BigFloat] {
  const { re: x, im: y } = z;
  if (x.compareAbs(y) >= 0) {
    if (!x.signbit()) return [0, realAtan2(y, x, bits)];
    return [y.signbit() ? -2 : 2, realAtan2(y.negate(), x.negate(), bits)];
  }
  if (!y.signbit()) return [1, realAtan2(x.negate(), y, bits)];
  return [-1, realAtan2(x, y.negate(), bits)];
}

/**
 * M·(cos θ + i sin θ) with M exact and θ = turns·π: a part is exact where its trigonometric
 * factor is rational, which at a rational multiple of π means 0, ±1 or ±½ (Niven's theorem,
 * from memory): cos at multiples of π/3, sin at odd multiples of π/6, both at multiples of π/2.
 * (−8)^(1/3) = 1 + √3·i has an exact real part.
 */
function exactMagnitudePower(M: BigFloat, turns: Rational, w: Rational, z: BigComplex, F: number): Approximation {
  const [s, c] = exactAngle(turns, w, z, F);
  const halfTurns = turns.mul(new Rational(2n));
  const half = (k: bigint, table: number[]) =>
    BigFloat.fromBigInt(BigInt(table[Number(((k % 12n) + 12n) % 12n)] as number), -1);
  if (halfTurns.isInteger()) return new Approximation(M.mul(c), M.mul(s), -Infinity, -Infinity);
  const thirds = turns.mul(new Rational(3n));
  const sixths = turns.mul(new Rational(6n));
  // Twice cos(jπ/3), indexed by 2j mod 12, and twice sin(jπ/6) for odd j, indexed by j mod 12.
  const cosine = thirds.isInteger() ? half(thirds.num * 2n, [2, 0, 1, 0, -1, 0, -2, 0, -1, 0, 1, 0]) : null;
  const sine =
    sixths.isInteger() && (sixths.num & 1n) === 1n ? half(sixths.num, [0, 1, 0, 2, 0, 1, 0, -1, 0, -2, 0, -1]) : null;
  const re = M.mul(cosine ?? c);
  const im = M.mul(sine ?? s);
  const err = (part: BigFloat, exact: boolean) => (exact || part.isZero() ? -Infinity : part.exponent() - F + 2);
  return new Approximation(re, im, err(re, cosine !== null), err(im, sine !== null));
}

function integerPower(z: BigComplex, n: number, bits: number): Approximation {
  // Starting from null rather than 1 + 0i: (1 + 0i)·(x − 0i) would turn the −0 into +0.
  let result: BigComplex | null = null;
  let base = z;
  for (let k = Math.abs(n); k > 0; k >>= 1) {
    if (k & 1) result = result ? result.mul(base) : base;
    if (k > 1) base = base.mul(base);
  }
  if (!result) return new Approximation(BigFloat.ONE, BigFloat.ZERO, -Infinity, -Infinity);
  if (n < 0) {
    const r = result.reciprocal(bits + 8);
    return Approximation.relative(r.re, r.im, bits);
  }
  return new Approximation(result.re, result.im, -Infinity, -Infinity);
}

function zeroBase(z: BigComplex, sign: number, bits: number): Approximation {
  const exact = (re: BigFloat, im: BigFloat) => new Approximation(re, im, -Infinity, -Infinity);
  if (sign > 0) return exact(BigFloat.ZERO, BigFloat.zero(z.im.signbit()));
  if (sign < 0) return exact(BigFloat.INF, BigFloat.ZERO);
  if (sign === 0) return integerPower(z, 0, bits);
  return exact(BigFloat.NAN, BigFloat.NAN);
}

/** cexp(w · clog z) with an infinite or NaN operand, the product in IEEE arithmetic. */
function formal(z: BigComplex, w: PowerExponent, bits: number): Approximation {
  const L = log.special(z)?.toApproximation(bits) ?? log.evaluate(z, bits);
  const l = new BigComplex(L.re, L.im);
  const [wr, wi] = complexParts(w, bits + 8);
  const P = w.kind === 'rational' ? l.mulReal(wr) : new BigComplex(wr, wi).mul(l);
  return exp.special(P)?.toApproximation(bits) ?? exp.evaluate(P, bits);
}
