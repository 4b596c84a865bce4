import type { WireComplex } from './wire-complex';

/** How far one part of a value is from the reference's: ulps apart and the absolute difference. */
export interface PartError {
  ulps: number;
  absolute: number;
}

/**
 * Why a point failed (docs/vocabulary.md). A failing point carries every label that applies
 * (point-outcome.ts); each label is one of these. `unexplained` is said honestly when a value is
 * none of the others: far from the expected value and from every alternative we know how to
 * compute. Which kinds are branch findings and which are accuracy findings is declared once, in
 * diagnosis-class.ts.
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
  /**
   * A jump along the path where none is expected, or none where one is. `t` is where the library
   * jumped (null: it did not). `confirmed`: the jump was refined between samples and stayed larger
   * than the reference's own change there (absent on diagnoses stored before refinement existed).
   */
  | { kind: 'misplaced-cut'; libraryJumpAt: number | null; expectedJumpAt: number | null; confirmed?: boolean }
  /**
   * Right branch and signs, but further from the reference than the tolerance allows. `part` is
   * the part that carries the error and `ulps` its distance: the larger of the two, unless that
   * one is tiny with its sign right and the other is further off absolutely
   * (harness/checks/measure-inaccuracy.ts); `signDiffers` says that part has the opposite sign.
   * `parts` gives each part's ulps and absolute error. `cancellation`: that part is tiny beside
   * the whole value (a part lost to cancellation), so its ulps say little; the absolute error and
   * the size of the whole value |reference| say what was lost. Older stored diagnoses lack the
   * optional fields.
   */
  | {
      kind: 'inaccurate';
      ulps: number;
      relativeError: number;
      part?: 're' | 'im';
      signDiffers?: boolean;
      parts?: { re: PartError; im: PartError };
      cancellation?: { part: 're' | 'im'; absoluteError: number; magnitude: number };
    }
  /** An infinite or NaN part where the reference is finite (or the reverse). */
  | { kind: 'not-finite' }
  /**
   * An agreement check failed: the same point through another subject or another entry (`with`
   * names it) gave `other`, which differs from this value. Both are shown with the reference, so a
   * reader sees which of the two left it.
   */
  | { kind: 'disagreement'; with: string; other: WireComplex | null; otherMatchesReference: boolean }
  | { kind: 'unexplained'; relativeError: number };

export type DiagnosisKind = Diagnosis['kind'];
