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
}
