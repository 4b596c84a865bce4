import type { ComplexPair } from '../adapters/complex-pair';

/** The least positive normal double: below it a value carries absolute, not relative, error. */
const MIN_NORMAL = 2 ** -1022;

/**
 * Whether a composed value `got` is close enough to `want` for a law: |got − want| ≤
 * bound·|want| + scale·2^−1022 + absolute (the 2^−1022 term is for subnormal results; `absolute`
 * is what the input's sensitivity allows, subject-sensitivity.ts). Infinities must match
 * exactly, NaN matches nothing.
 */
export function composedClose(
  got: ComplexPair,
  want: ComplexPair,
  bound: number,
  scale: number,
  absolute = 0,
): boolean {
  if (![...got, ...want].every(Number.isFinite)) {
    return got[0] === want[0] && got[1] === want[1];
  }
  return (
    Math.hypot(got[0] - want[0], got[1] - want[1]) <=
    bound * Math.hypot(want[0], want[1]) + scale * MIN_NORMAL + absolute
  );
}
