/**
 * Complex values at many points, column-wise: re and im as doubles (zero signs kept), and the
 * error of each point that has no value (threw, timed out, unsupported, cancelled).
 */
export interface ValueColumn {
  re: Float64Array;
  im: Float64Array;
  errors: Map<number, string>;
}
