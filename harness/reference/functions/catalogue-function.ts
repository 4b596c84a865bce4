import type { Approximation } from '../complex/approximation';
import type { BigComplex } from '../complex/big-complex';
import type { SpecialValue } from '../complex/special-value';
import type { Cut } from './cut';

/** A single-argument function of the catalogue with its principal branch. */
export interface CatalogueFunction {
  name: string;
  cuts: readonly Cut[];
  /** The value fixed by a special-value rule (infinite or NaN parts, poles), or null to compute. */
  special(z: BigComplex): SpecialValue | null;
  /** The principal value at a finite non-special z, each part to 2^−bits relative (zeros exact). */
  evaluate(z: BigComplex, bits: number): Approximation;
}
