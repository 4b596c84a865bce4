import { BigFloat } from '../numbers/big-float';
import { bitLength } from '../numbers/bit-length';
import { FixedTables } from './fixed-tables';

/** Largest count of extra reduction bits tried before giving up on a point absurdly close to a multiple of π/2. */
const MAX_EXTRA = 1 << 15;

/**
 * [sin x, cos x] for finite x, each with relative error below 2^−bits;
 * sin(±0) = ±0 and cos(±0) = 1 exactly.
 *
 * x = q·π/2 + r with |r| ≤ π/4, π taken to F + (integer bits of x) + extra bits;
 * when r comes out with fewer than F significant bits (x near a multiple of π/2,
 * e.g. the double 3.141592653589793 is 1.2e−16 from π) the reduction is redone
 * with more bits, so r is always relatively accurate. Then r = j/64 + d with
 * table values of sin, cos at j/64 and series in d.
 */
export function realSinCos(x: BigFloat, bits: number): [BigFloat, BigFloat] {
  if (x.isZero()) return [x, BigFloat.ONE];
  const F = FixedTables.levelFor(bits);
  const T = FixedTables.at(F);
  let q = 0n;
  let r = x;
  if (x.exponent() >= 0) {
    for (let extra = 32; ; extra *= 2) {
      const G = F + Math.max(0, x.exponent()) + extra;
      const halfPi = FixedTables.pi(G + 1) >> 2n;
      const X = x.toFixed(G);
      q = floorDiv(2n * X + halfPi, 2n * halfPi);
      const R = X - q * halfPi;
      if (extra < MAX_EXTRA && (R === 0n || bitLength(R < 0n ? -R : R) < G - extra + 8)) continue;
      r = BigFloat.fromBigInt(R, -G).truncate(F);
      break;
    }
  }
  const [s, c] = reducedSinCos(r, F, T);
  switch (Number(((q % 4n) + 4n) % 4n)) {
    case 0:
      return [s, c];
    case 1:
      return [c, s.negate()];
    case 2:
      return [s.negate(), c.negate()];
    default:
      return [c.negate(), s];
  }
}

function floorDiv(a: bigint, b: bigint): bigint {
  const q = a / b;
  return q * b > a ? q - 1n : q;
}

function reducedSinCos(r: BigFloat, F: number, T: FixedTables): [BigFloat, BigFloat] {
  const shift = BigInt(F);
  const R = r.toFixed(F);
  const j = Math.round(Number(R >> BigInt(Math.max(0, F - 20))) / 2 ** 14);
  if (j === 0) {
    const W = r.mul(r).toFixed(F);
    const [sinFactor, cosD] = series(W, F, T);
    return [r.mul(BigFloat.fromBigInt(sinFactor, -F)).truncate(F), BigFloat.fromBigInt(cosD, -F)];
  }
  const a = Math.abs(j);
  const D = R - (BigInt(j) << BigInt(F - 6));
  const [sinFactor, cosD] = series((D * D) >> shift, F, T);
  const sinD = (D * sinFactor) >> shift;
  const sj = j < 0 ? -(T.sinTable[a] as bigint) : (T.sinTable[a] as bigint);
  const cj = T.cosTable[a] as bigint;
  const s = (sj * cosD + cj * sinD) >> shift;
  const c = (cj * cosD - sj * sinD) >> shift;
  return [BigFloat.fromBigInt(s, -F), BigFloat.fromBigInt(c, -F)];
}

/** [sin d / d, cos d] in fixed point from W = d² · 2^F, d ≤ 1/128. */
function series(W: bigint, F: number, T: FixedTables): [bigint, bigint] {
  const shift = BigInt(F);
  const n = Math.min(Math.ceil(F / 14) + 2, (T.inverseFactorial.length - 2) >> 1);
  let s = T.inverseFactorial[2 * n + 1] as bigint;
  let c = T.inverseFactorial[2 * n] as bigint;
  for (let i = n - 1; i >= 0; i--) {
    s = (T.inverseFactorial[2 * i + 1] as bigint) - ((W * s) >> shift);
    c = (T.inverseFactorial[2 * i] as bigint) - ((W * c) >> shift);
  }
  return [s, c];
}
