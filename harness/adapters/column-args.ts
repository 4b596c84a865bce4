import type { ComplexPair } from './complex-pair';

/**
 * One argument of a column-wise batch: a value per point (re and im arrays), or one constant for
 * all. A column an in-process library made itself also carries its own `values` (its objects, or
 * plain numbers), which the next step takes as they are, as a user's code would: parts are never
 * read out and built again between steps.
 */
export type ColumnArg = { re: Float64Array; im: Float64Array; values?: unknown[] } | ComplexPair;

/** The answer of a column-wise batch: values per point, and the error of each point that has none. */
export interface ColumnResult {
  re: Float64Array;
  im: Float64Array;
  errors: Map<number, string>;
  /** The library's own value at each point (in-process targets), for the next step to take as it is. */
  values?: unknown[];
}
