import type { ComplexPair } from '../adapters/complex-pair';

/** Why a law failed at a point, with the library values that show it (named as in the law's formula). */
export interface LawFinding {
  reason: string;
  values: { name: string; value: ComplexPair }[];
}
