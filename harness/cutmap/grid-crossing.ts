import type { ComplexPair } from '../adapters/complex-pair';

/**
 * A discontinuity found between two grid neighbours: where (refined by bisection) and on
 * which grid edge — `h` from (row, column) to (row, column + 1), `v` from (row, column) to
 * (row + 1, column).
 */
export interface GridCrossing {
  at: ComplexPair;
  edge: { kind: 'h' | 'v'; row: number; column: number };
}
