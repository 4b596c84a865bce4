import { BigFloat } from '../numbers/big-float';
import { FixedTables } from './fixed-tables';

/** Beyond this |x| the result leaves the exponent range a JS number can index (2^±(2^40·1.44)). */
const LIMIT = 2 ** 40;
const SATURATED = 2 ** 42;

/**
 * e^x for finite x, with relative error below 2^−bits; e^0 = 1 exactly.
 *
 * x = k ln 2 + j/64 + d with |d| ≤ 1/128 + 2^−F: e^x = 2^k · exp(j/64) · Σ dⁿ/n!.
 * The reduction uses ln 2 with as many extra bits as x has integer bits, so the
 * remainder is correct to 2^−F absolutely, which is relative error for e^r.
 * |x| > 2^40 returns 2^(±2^42), a finite stand-in far beyond binary64 (the true value is
 * beyond 2^(±10^12)): it rounds to +∞ or +0 as the true value does, and it stays finite and
 * non-zero, so a caller multiplying it by cos y or sin y keeps their signs (∞ · 0 would be NaN)
 * and the answer can name the overflow or underflow (IEEE 754-2019 §7.4, §7.5).
 */
export function realExp(x: BigFloat, bits: number): BigFloat {
  if (x.isZero()) return BigFloat.ONE;
  const approx = x.toDouble();
  if (Math.abs(approx) > LIMIT) return BigFloat.of(false, 1n, approx > 0 ? SATURATED : -SATURATED);
  const F = FixedTables.levelFor(bits);
  const T = FixedTables.at(F);
  const extra = Math.max(0, x.exponent()) + 8;
  const G = F + extra;
  const k = Math.round(approx / Math.LN2);
  const R = (x.toFixed(G) - (BigInt(k) * FixedTables.ln2(G + 48)) / (1n << 48n)) >> BigInt(extra);
  const j = Math.max(-32, Math.min(32, Math.round(Number(R >> BigInt(F - 20)) / 2 ** 14)));
  const D = R - (BigInt(j) << BigInt(F - 6));
  const n = Math.min(Math.ceil(F / 7) + 2, T.inverseFactorial.length - 1);
  const shift = BigInt(F);
  let s = T.inverseFactorial[n] as bigint;
  for (let i = n - 1; i >= 0; i--) s = (T.inverseFactorial[i] as bigint) + ((D * s) >> shift);
  return BigFloat.fromBigInt(((T.expTable[j + 32] as bigint) * s) >> shift, k - F);
}
