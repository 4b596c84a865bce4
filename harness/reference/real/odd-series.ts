import { bitLength } from '../numbers/bit-length';
import type { FixedTables } from './fixed-tables';

/**
 * Σ (±1)^i · w^i / (2i+1) in fixed point at level F, for 0 ≤ w ≤ 2^−13 given as
 * W = w · 2^F: the factor that turns t into atanh t (plain signs) or atan t
 * (alternating signs) as t · Σ. Horner's rule from the last needed term; each
 * term gains at least 13 bits, so F/13 + 1 terms reach 2^−F.
 */
export function oddSeries(W: bigint, F: number, T: FixedTables, alternating: boolean): bigint {
  const bitsPerTerm = W === 0n ? F : F - bitLength(W);
  const n = Math.min(Math.ceil(F / Math.max(bitsPerTerm, 1)) + 1, T.inverseOdd.length - 1);
  const shift = BigInt(F);
  const w = alternating ? -W : W;
  let s = T.inverseOdd[n] as bigint;
  for (let i = n - 1; i >= 0; i--) s = (T.inverseOdd[i] as bigint) + ((w * s) >> shift);
  return s;
}
