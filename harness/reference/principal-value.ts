import type { Approximation } from './complex/approximation';
import { evaluateFunction, type PrincipalRequest } from './evaluate-function';

export type { PrincipalRequest } from './evaluate-function';

/** What the caller needs settled: the correctly rounded double, and/or `digits` correct significant digits. */
export interface PrincipalNeeds {
  double: boolean;
  digits: number;
}

export interface PrincipalResult {
  approximation: Approximation;
  double: [number, number];
  /** False only if the precision cap was reached before the rounding was decided. */
  settled: boolean;
}

const MAX_BITS = 1 << 14;
const LOG2_10 = Math.log2(10);

/**
 * The principal value of a catalogue function, with Ziv's strategy: evaluate with a
 * proven error bound at a modest precision (64 bits when only the double is wanted),
 * and double the precision only while the bound leaves the rounding of a part
 * undecided — i.e. the interval value ± bound holds two doubles (or both zero signs),
 * or fewer than `digits` digits are certain.
 *
 * The bounds come from each function's formula (no cancellation, exact polynomials,
 * kernels correct to 2^−bits relative); see {@link evaluateFunction}.
 *
 * Why bigints rather than decimal.js: a naive decimal.js complex log at 34 digits cost ~0.8 ms,
 * 25× slower than mpmath (docs/conventions.md). This engine, with table-reduced series on bigint fixed point,
 * produced 40-digit strings at 34,000–75,000 points/s on the bench's 9-function mix, 1.3–2.9× mpmath
 * at 40 digits over six runs on a loaded 2-core machine; 88,000–90,000 points/s, 2.15–2.23×, over three
 * runs of the interleaved bench at load average 4–5.6, once integerSqrt, bitLength and toDecimal
 * had been sped up without changing a bit. For doubles alone see principalDouble.
 */
export function principalValue(request: PrincipalRequest, needs: PrincipalNeeds): PrincipalResult {
  const wantBits = needs.digits > 0 ? Math.ceil(needs.digits * LOG2_10) + 4 : 0;
  let bits = Math.max(needs.double ? 64 : 0, wantBits + 8);
  for (;;) {
    const a = evaluateFunction(request, bits);
    const settled = a.decided(needs.double, wantBits);
    if (settled || bits >= MAX_BITS) {
      // Rounded when read, so a caller after digits alone never pays for it (2.7% of the 40-digit bench);
      // every caller reads it once.
      return {
        approximation: a,
        get double(): [number, number] {
          return [a.re.toDouble(), a.im.toDouble()];
        },
        settled,
      };
    }
    bits *= 2;
  }
}
