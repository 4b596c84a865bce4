import { BigFloat } from './big-float';
import { parseNumber } from './parse-number';

/**
 * Reads a wire number as a library would receive it: the binary64 nearest to the
 * written value (ties to even), "-0" as negative zero, hex floats exactly.
 *
 * A ratio p/q is rounded the same way: the quotient is taken to 80 bits with a
 * sticky bit for a non-zero remainder, which makes the final rounding exact.
 */
export function parseDouble(text: string): number {
  const parsed = parseNumber(text);
  if (parsed.kind === 'special') return parsed.value.toDouble();
  if (parsed.negativeZero) return -0;
  const { num, den } = parsed.value;
  if (num === 0n) return 0;
  const magnitude = num < 0n ? -num : num;
  const shift = Math.max(0, 80 + den.toString(2).length - magnitude.toString(2).length);
  const scaled = magnitude << BigInt(shift);
  const q = scaled / den;
  const sticky = q * den === scaled ? 0n : 1n;
  return BigFloat.of(num < 0n, (q << 1n) | sticky, -shift - 1).toDouble();
}
