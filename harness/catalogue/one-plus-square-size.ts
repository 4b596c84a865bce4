import type { ComplexPair } from '../adapters/complex-pair';

/**
 * |1 + z²| as |1 + iz|·|1 − iz| = |(1 − y) + ix|·|(1 + y) − ix|: no cancellation next to z = ±i
 * (the branch points of atan, asinh, acot, acsch).
 */
export function onePlusSquareSize([x, y]: ComplexPair): number {
  return Math.hypot(1 - y, x) * Math.hypot(1 + y, x);
}
