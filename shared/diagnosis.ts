/**
 * Why a point failed (docs/vocabulary.md). `unexplained` is said honestly when a value is none of
 * the others: far from the expected value and from every alternative we know how to compute.
 */
export type Diagnosis =
  /** The value is the expected one on another sheet: ·e^{2πiνk} for roots and powers, + 2πik for log. */
  | { kind: 'other-sheet'; k: number }
  /** The value is the limit from the other side of a cut: the wrong side is closed. */
  | { kind: 'cut-side' }
  /**
   * A ±0 was treated as the other sign: of the input (the value is the reference at the input
   * with that zero flipped), or of the output (right value, a zero part with the wrong sign).
   */
  | { kind: 'zero-sign'; part: 're' | 'im'; of: 'input' | 'output' }
  /** A jump along the path where none is expected, or none where one is. `t` is where the library jumped (null: it did not). */
  | { kind: 'misplaced-cut'; libraryJumpAt: number | null; expectedJumpAt: number | null }
  /**
   * Right branch, but further from the reference than the tolerance allows. `ulps` is the larger
   * of the two parts' distances, in `part`; `signDiffers` says that part has the opposite sign
   * (a tiny part lost to cancellation). Both are missing from diagnoses stored before they were.
   */
  | { kind: 'inaccurate'; ulps: number; relativeError: number; part?: 're' | 'im'; signDiffers?: boolean }
  /** An infinite or NaN part where the reference is finite (or the reverse). */
  | { kind: 'not-finite' }
  | { kind: 'unexplained'; relativeError: number };

export type DiagnosisKind = Diagnosis['kind'];
