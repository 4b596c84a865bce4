import { BigFloat } from '../numbers/big-float';
import { bitLength } from '../numbers/bit-length';
import { FixedTables } from './fixed-tables';
import { oddSeries } from './odd-series';

/**
 * ln x for finite x > 0, with relative error below 2^−bits; ln 1 = +0 exactly.
 *
 * x = f · 2^k with f ∈ [1/√2, √2). Then ln x = k ln 2 + ln(1 + j/64) + ln(1 + u)
 * with the table entry nearest f and |u| ≤ 1/128, the last as 2 atanh(u/(2+u)).
 * When k ≠ 0 the result is ≥ 0.34 in magnitude and when j ≠ 0 it is ≥ 2^−8, so
 * absolute fixed-point error at F = bits + 24 is relative error below 2^−bits.
 * When k = 0 and j = 0, x − 1 is formed exactly and the series is summed relative
 * to it, so ln(1 + 1e−300) keeps its full precision.
 */
export function realLog(x: BigFloat, bits: number): BigFloat {
  if (x.m === 1n && x.e === 0 && !x.neg) return BigFloat.ZERO;
  const F = FixedTables.levelFor(bits);
  const T = FixedTables.at(F);
  const b = bitLength(x.m);
  let k = x.e + b;
  const lead = Number(x.m >> BigInt(Math.max(0, b - 53))) / 2 ** Math.min(b, 53);
  let f = lead;
  if (lead < Math.SQRT1_2) {
    k -= 1;
    f = 2 * lead;
  }
  const j = Math.round((f - 1) * 64);
  if (k === 0 && j === 0) {
    const u = x.sub(BigFloat.ONE);
    const t = u.div(u.add(BigFloat.fromBigInt(2n)), F);
    const t2 = t.mul(t).toFixed(F);
    return t.mul(BigFloat.fromBigInt(oddSeries(t2, F, T, false), 1 - F)).truncate(F);
  }
  const X = BigFloat.of(false, x.m, -b + (f === lead ? 0 : 1)).toFixed(F);
  const c = BigInt(64 + j);
  const U = (64n * X - c * T.one) / c;
  const t = (U << BigInt(F)) / (2n * T.one + U);
  const series = (t * oddSeries((t * t) >> BigInt(F), F, T, false)) >> BigInt(F - 1);
  let sum = (T.logTable[j + 32] as bigint) + series;
  if (k !== 0) sum += (BigInt(k) * FixedTables.ln2(F + 64)) >> 64n;
  return BigFloat.fromBigInt(sum, -F);
}
