const scratch = new Float64Array(1);
const asInt = new BigInt64Array(scratch.buffer);

/** The double's bit pattern mapped to a line where adjacent doubles differ by 1 and −0 = +0 = 0. */
function ordinal(x: number): bigint {
  scratch[0] = x;
  const bits = asInt[0] as bigint;
  return bits < 0n ? -(bits & 0x7fffffffffffffffn) : bits;
}

/**
 * Number of doubles between a and b (0 when equal; ±0 count as equal, so check zero
 * signs separately), Infinity when exactly one is NaN, 0 when both are. Infinities sit
 * one step beyond the largest finite double, as in the IEEE 754 ordering.
 */
export function ulpDistance(a: number, b: number): number {
  if (a !== a || b !== b) return a !== a && b !== b ? 0 : Infinity;
  const d = ordinal(a) - ordinal(b);
  return Number(d < 0n ? -d : d);
}
