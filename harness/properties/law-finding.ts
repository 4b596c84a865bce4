import type { ComplexPair } from '../adapters/complex-pair';

/**
 * Why a law failed at a point, with the library values that show it (named as in the law's
 * formula) and, for a law that equates two values, the names of its two sides among them.
 */
export interface LawFinding {
  reason: string;
  values: { name: string; value: ComplexPair }[];
  sides?: [string, string];
}
