import { BigFloat } from '../numbers/big-float';
import { realAtan2 } from '../real/real-atan2';
import { realLog } from '../real/real-log';
import { BigComplex } from './big-complex';

const FOUR = BigFloat.fromBigInt(4n);

/**
 * atanh z for finite z other than ±1 ± 0i:
 * Re = ¼ ln(1 + 4x/((1 − x)² + y²)), Im = ½ atan2(2y, (1 − x)(1 + x) − y²)
 * (DLMF 4.37.24 rewritten; the real part is ¼ ln(|1+z|²/|1−z|²)). Both polynomials
 * are formed exactly. The real part is computed for x ≥ +0 only (atanh is odd), so
 * 1 + 4x/(…) ≥ 1 and its log is relatively accurate; a zero x gives ±0 exactly,
 * and a zero y gives atan2(±0, ·) = ±0 or ±π, i.e. the side of the cut y's sign names.
 */
export function kahanAtanh(z: BigComplex, bits: number): BigComplex {
  if (z.re.signbit()) return kahanAtanh(z.negate(), bits).negate();
  const w = bits + 8;
  const { re: x, im: y } = z;
  const oneMinus = BigFloat.ONE.sub(x);
  const den = oneMinus.mul(oneMinus).add(y.mul(y));
  const q = FOUR.mul(x).div(den, w);
  const re = x.isZero() ? x : realLog(BigFloat.ONE.add(q), w).scale(-2);
  const im = realAtan2(y.scale(1), oneMinus.mul(BigFloat.ONE.add(x)).sub(y.mul(y)), w).scale(-1);
  return new BigComplex(re, im);
}
