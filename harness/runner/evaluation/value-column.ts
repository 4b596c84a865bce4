/**
 * Complex values at many points, column-wise: re and im as doubles (zero signs kept), and the
 * error of each point that has no value (threw, timed out, unsupported, cancelled).
 */
export interface ValueColumn {
  re: Float64Array;
  im: Float64Array;
  errors: Map<number, string>;
  /** An in-process library's own value at each point (column-args.ts), passed as it is to the next step. */
  values?: unknown[];
  /**
   * For a subject's value: every step's values in program order (subject-program.ts), a column
   * for each operation and the constant itself for a constant, so a composed subject's
   * intermediate values can be shown. Absent on other columns.
   */
  steps?: (ValueColumn | [number, number])[];
}
