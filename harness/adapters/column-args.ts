import type { ComplexPair } from './complex-pair';

/** One argument of a column-wise batch: a value per point (re and im arrays), or one constant for all. */
export type ColumnArg = { re: Float64Array; im: Float64Array } | ComplexPair;

/** The answer of a column-wise batch: values per point, and the error of each point that has none. */
export interface ColumnResult {
  re: Float64Array;
  im: Float64Array;
  errors: Map<number, string>;
}
