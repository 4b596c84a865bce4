import { BigFloat } from '../numbers/big-float';
import { FixedTables } from './fixed-tables';
import { oddSeries } from './odd-series';

/**
 * atan2(y, x) for finite y, x with relative error below 2^−bits, following the
 * IEEE 754 / ISO C 7.12.4.4 rules for zeros: atan2(±0, +0 or x > 0) = ±0,
 * atan2(±0, −0 or x < 0) = ±π, atan2(y ≠ 0, ±0) = ±π/2.
 *
 * With t = min(|x|,|y|)/max(|x|,|y|) ≤ 1, atan t = atan(j/64) + atan((t − c)/(1 + tc))
 * with c = j/64; the result is atan t, π − atan t, or π/2 ∓ atan t. Only the first can
 * be small, and it is computed relative to t, so no case loses precision.
 */
export function realAtan2(y: BigFloat, x: BigFloat, bits: number): BigFloat {
  const F = FixedTables.levelFor(bits);
  const negY = y.signbit();
  if (y.isZero()) {
    if (!x.signbit()) return y;
    return BigFloat.fromBigInt(FixedTables.pi(F), -F).withSign(negY);
  }
  if (x.isZero()) return BigFloat.fromBigInt(FixedTables.pi(F + 1) >> 2n, -F).withSign(negY);
  const T = FixedTables.at(F);
  const ay = y.abs();
  const ax = x.abs();
  if (ay.compareAbs(ax) <= 0) {
    const a = atanUnit(ay.div(ax, F), F, T);
    if (!x.signbit()) return a.withSign(negY);
    return BigFloat.fromBigInt(FixedTables.pi(F) - a.toFixed(F), -F).withSign(negY);
  }
  const A = atanUnit(ax.div(ay, F), F, T).toFixed(F);
  const halfPi = FixedTables.pi(F + 1) >> 2n;
  return BigFloat.fromBigInt(x.signbit() ? halfPi + A : halfPi - A, -F).withSign(negY);
}

/** atan t for 0 < t ≤ 1 (relative error below 2^−(F−24)). */
function atanUnit(t: BigFloat, F: number, T: FixedTables): BigFloat {
  const shift = BigInt(F);
  const Tt = t.toFixed(F);
  const j = Math.round(Number(Tt >> BigInt(F - 20)) / 2 ** 14);
  if (j === 0) {
    const W = t.mul(t).toFixed(F);
    return t.mul(BigFloat.fromBigInt(oddSeries(W, F, T, true), -F)).truncate(F);
  }
  const C = BigInt(j) << BigInt(F - 6);
  const D = ((Tt - C) << shift) / (T.one + ((Tt * C) >> shift));
  const A = (T.atanTable[j] as bigint) + ((D * oddSeries((D * D) >> shift, F, T, true)) >> shift);
  return BigFloat.fromBigInt(A, -F);
}
