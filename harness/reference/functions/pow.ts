import { Approximation } from '../complex/approximation';
import { BigComplex } from '../complex/big-complex';
import type { PowerExponent } from '../complex/power-exponent';
import { BigFloat } from '../numbers/big-float';
import { Rational } from '../numbers/rational';
import { FixedTables } from '../real/fixed-tables';
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
 * Exact zero parts: when z lies on an axis and w is real, arg z^w = w·kπ/2 is a rational
 * multiple of π, and a part that is exactly zero ((−4)^(1/2) = 0 + 2i) is made exactly
 * zero instead of being approached forever by the rounding loop.
 */
export function pow(z: BigComplex, w: PowerExponent, bits: number): Approximation {
  const exponent = asRational(w);
  if (exponent && exponent.isInteger() && abs(exponent.num) <= MAX_EXACT_INTEGER && z.isFinite()) {
    return integerPower(z, Number(exponent.num), bits);
  }
  const wc = w.kind === 'complex' ? w.value : null;
  if (!z.isFinite() || (wc && !wc.isFinite())) return formal(z, w, bits);
  if (z.isZero()) return zeroBase(z, exponent ? exponent.compare(Rational.ZERO) : realSign(wc as BigComplex), bits);
  const approxLog = Math.abs(Math.log(Math.hypot(z.re.toDouble(), z.im.toDouble()) || Number.MIN_VALUE)) + 4;
  const wr = exponent ? exponent : null;
  const wMag = wr
    ? Math.abs(Number(wr.num) / Number(wr.den)) || 1
    : Math.hypot((wc as BigComplex).re.toDouble(), (wc as BigComplex).im.toDouble());
  const scale = Math.max(0, Math.ceil(Math.log2(wMag * approxLog + 1)));
  const F = bits + 24 + scale;
  const L = log.evaluate(z, F);
  let Pr: BigFloat;
  let Pi: BigFloat;
  if (wr) {
    const r = wr.toBigFloat(F + 8);
    Pr = r.mul(L.re).truncate(F + 8);
    Pi = r.mul(L.im).truncate(F + 8);
  } else {
    const c = wc as BigComplex;
    Pr = c.re
      .mul(L.re)
      .sub(c.im.mul(L.im))
      .truncate(F + 8);
    Pi = c.re
      .mul(L.im)
      .add(c.im.mul(L.re))
      .truncate(F + 8);
  }
  const M = realExp(Pr, F);
  const quarterTurns = wr ? axisQuarterTurns(z) : null;
  if (wr && quarterTurns !== null) {
    const [s, c] = exactAngle(wr.mul(new Rational(BigInt(quarterTurns), 2n)), wr, z, F);
    return Approximation.relative(M.mul(c), M.mul(s), bits);
  }
  const [s, c] = realSinCos(Pi, F);
  const err = M.exponent() + scale + 4 - F;
  const re = M.mul(c);
  const im = M.mul(s);
  return new Approximation(re, im, re.isZero() ? -Infinity : err, im.isZero() ? -Infinity : err);
}

function abs(n: bigint): bigint {
  return n < 0n ? -n : n;
}

function asRational(w: PowerExponent): Rational | null {
  if (w.kind === 'rational') return w.value;
  const { re, im } = w.value;
  if (im.isZero() && re.isFinite()) return Rational.fromDouble(re.toDouble());
  return null;
}

function realSign(w: BigComplex): number {
  if (w.re.isZero()) return w.im.isZero() ? 0 : NaN;
  return w.re.signbit() ? -1 : 1;
}

/** arg z / (π/2) when z is on an axis: 0 for x > 0, ±1 for ±iy, ±2 for x < 0 (sign of y). */
function axisQuarterTurns(z: BigComplex): number | null {
  if (z.im.isZero()) return z.re.signbit() ? (z.im.signbit() ? -2 : 2) : 0;
  if (z.re.isZero()) return z.im.signbit() ? -1 : 1;
  return null;
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
  const theta = BigFloat.fromBigInt(turns.num * FixedTables.pi(G)).div(BigFloat.fromBigInt(turns.den << BigInt(G)), G);
  return realSinCos(theta, F);
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
  const P = w.kind === 'complex' ? w.value.mul(l) : l.mulReal(w.value.toBigFloat(bits + 8));
  return exp.special(P)?.toApproximation(bits) ?? exp.evaluate(P, bits);
}
