import { BigFloat } from '../numbers/big-float';
import { bitLength } from '../numbers/bit-length';
import type { Rational } from '../numbers/rational';

/** Past this many bits in r^p the exact product is not formed (the rounding loop then decides). */
const MAX_RESULT_BITS = 1 << 16;
/** Longer odd parts of |z| are not tried for a q-th root. */
const MAX_ROOT_INPUT_BITS = 1100;
/** 2^(e·p/q) with |e·p/q| past this is left to the saturating e^x of the formula. */
const MAX_EXPONENT = 2 ** 40;

/**
 * a^(p/q) for a > 0 exactly, when it is a binary fraction: a = r^q with r = s·2^k (s odd), and
 * then a^(p/q) = r^p, for p ≥ 0, or for any p when s = 1. Null otherwise; for p < 0 and s > 1 the
 * value 1/s^|p| is not a binary fraction, so it is neither a double nor a midpoint between two and
 * the rounding loop settles it.
 *
 * Why: an exact value can be a midpoint between two doubles, where no error bound ever settles the
 * rounding. (262143²)^(3/2) = 262143³ = 18014192351838207 has 54 bits; it escalated to the
 * 16,384-bit cap and took 21.9 s before.
 */
export function exactPowerMagnitude(a: BigFloat, w: Rational): BigFloat | null {
  if (!a.isFinite() || a.isZero()) return null;
  let m = a.m;
  let e = a.e;
  while ((m & 1n) === 0n) {
    m >>= 1n;
    e += 1;
  }
  const q = w.den;
  const p = w.num;
  if (bitLength(m) > MAX_ROOT_INPUT_BITS) return null;
  if (BigInt(e) % q !== 0n) return null;
  const k = BigInt(e) / q;
  const s = integerRoot(m, q);
  if (s === null) return null;
  const exponent = k * p;
  if (exponent > BigInt(MAX_EXPONENT) || exponent < -BigInt(MAX_EXPONENT)) return null;
  if (s === 1n) return BigFloat.of(false, 1n, Number(exponent));
  if (p < 0n || p * BigInt(bitLength(s)) > BigInt(MAX_RESULT_BITS)) return null;
  return BigFloat.of(false, s ** p, Number(exponent));
}

/** The integer s with s^q = m, or null when m (odd, > 0) is not a q-th power. */
function integerRoot(m: bigint, q: bigint): bigint | null {
  if (m === 1n) return 1n;
  const bits = bitLength(m);
  if (q > BigInt(bits)) return null;
  const n = Number(q);
  // A double estimate from the leading bits, then a check of it and its neighbours: exact for
  // every root below 2^53, so for every double z (an odd part of at most 53 bits). A longer root
  // may be missed; the rounding loop then decides, as it does for any inexact value.
  const drop = Math.max(0, bits - 1000);
  const estimate = Math.pow(Number(m >> BigInt(drop)), 1 / n) * Math.pow(2, drop / n);
  if (!Number.isFinite(estimate)) return null;
  const guess = BigInt(Math.round(estimate));
  for (const s of [guess - 1n, guess, guess + 1n]) if (s > 0n && s ** q === m) return s;
  return null;
}
