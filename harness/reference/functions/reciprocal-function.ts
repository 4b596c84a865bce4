import type { CatalogueFunction } from './catalogue-function';
import type { Cut } from './cut';

/**
 * A reciprocal inverse function f(z) = g(1/z) (DLMF 4.23.7–9, 4.37.7–9). It is evaluated
 * by forming w = 1/z (IEEE zero signs: Im(1/z) = −y/|z|², so a real z gives a zero with
 * the opposite sign) and taking g's principal value at w under the same convention; `cuts`
 * lists where that puts the cuts in the z-plane.
 */
export interface ReciprocalFunction {
  name: string;
  inner: CatalogueFunction;
  cuts: readonly Omit<Cut, 'ccwSide'>[];
  /**
   * g's derivative as |g′(w)| = |1 + sign·w²|^(−power) (DLMF 4.24.1–4.24.3 for asin, acos, atan;
   * 4.38.1–4.38.3 for asinh, acosh, atanh), used to bound what rounding 1/z costs.
   */
  derivative: { sign: 1 | -1; power: 0.5 | 1 };
}
