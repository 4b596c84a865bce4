/**
 * One way a value gets into a library (docs/vocabulary.md, "entry"): its constructor from two
 * numbers, its object or string form, its expression parser, or a plain number. A suite or a path
 * names the entry it builds its inputs with (`"entry": "string"`); a target lists the entries it
 * offers in `TargetIdentity.entries`, its default first.
 *
 * `carries` says what the entry can express at all, whatever the library then does with it: a
 * string can write "-0", so a string entry carries both zero signs (and a library that loses one
 * there is a finding); a plain number has no imaginary part, so a number entry carries none, and
 * a point with one is not applicable to it (never a failure).
 */
export interface TargetEntry {
  /** Lower-case word used in suites and results: "complex", "object", "array", "string", "parser", "number". */
  name: string;
  /** How a value is built, in the library's own words: "new Complex(re, im)". */
  call: string;
  /** The library's documented constructor from two numbers, used when a suite names no entry. */
  default: boolean;
  carries: {
    /** A nonzero imaginary part at all. */
    imaginaryPart: boolean;
    /** The sign of a zero real part. */
    realZeroSign: boolean;
    /** The sign of a zero imaginary part (and, read back, of a result's zero imaginary part). */
    imaginaryZeroSign: boolean;
  };
}
