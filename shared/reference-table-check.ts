import type { WireComplex } from './wire-complex';

/** What checking an uploaded table of reference values against our reference engine found. */
export interface ReferenceTableCheck {
  rows: number;
  agree: number;
  /** Rows whose value differs from ours by more than 1 ulp in a part, or in a zero's sign. */
  disagreements: {
    line: number;
    z: WireComplex;
    theirs: WireComplex;
    ours: WireComplex;
    ulps: number;
    source: string;
  }[];
  /** Rows that could not be read. */
  invalid: { line: number; reason: string }[];
}
