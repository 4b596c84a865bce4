import { BigFloat } from '../numbers/big-float';
import { FixedTables } from './fixed-tables';
import { realLog } from './real-log';

/**
 * asinh v for finite v with relative error below 2^−bits; asinh(±0) = ±0.
 *
 * asinh v = sign(v) · ln(1 + w), w = |v| + v²/(1 + √(1 + v²)): every term is
 * positive, so nothing cancels, and 1 + w is formed exactly before the log, whose
 * k = 0 path keeps tiny w relatively accurate (asinh 1e−300 = 1e−300).
 */
export function realAsinh(v: BigFloat, bits: number): BigFloat {
  if (v.isZero()) return v;
  const F = FixedTables.levelFor(bits);
  const a = v.abs();
  const a2 = a.mul(a).truncate(2 * F);
  const root = BigFloat.ONE.add(a2).sqrt(F);
  const w = a.add(a2.div(BigFloat.ONE.add(root), F)).truncate(F + 8);
  return realLog(BigFloat.ONE.add(w), bits + 8).withSign(v.signbit());
}
