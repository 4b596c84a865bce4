import type { ComplexPair } from '../adapters/complex-pair';

/**
 * |1 − z²| as |1 − z|·|1 + z|: the product has no cancellation, where 1 − z² in doubles loses
 * every digit next to z = ±1 (the branch points of asin, acos, atanh, acoth, asech).
 */
export function oneMinusSquareSize([x, y]: ComplexPair): number {
  return Math.hypot(1 - x, y) * Math.hypot(1 + x, y);
}
