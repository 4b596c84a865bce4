import type { Tolerance } from '../../shared/schemas/tolerance-schema';
import type { ComplexDouble } from './complex-double';
import type { ValueCheck } from './value-check';

/** A failing point with the alternative values a diagnosis is chosen among, all from the reference. */
export interface FailureContext {
  actual: ComplexDouble;
  expected: ComplexDouble;
  check: ValueCheck;
  /** The suite's value tolerance: a label of accuracy is added only outside it. */
  tolerance: Tolerance;
  /** The reference at the same input with one zero part's sign flipped (inputs with a zero part, signed-zero convention). */
  flippedZero?: { part: 're' | 'im'; value: ComplexDouble };
  /** The reference's limit from the other side of the cut the point lies on or next to. */
  otherSide?: ComplexDouble;
  /** The expected value moved to other sheets, by k. */
  otherSheets?: { k: number; value: ComplexDouble }[];
}
