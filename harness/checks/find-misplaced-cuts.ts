import type { Diagnosis } from '../../shared/diagnosis';
import type { ComplexDouble } from './complex-double';
import { detectJumps } from './detect-jumps';

/** Leading labels that a wrong jump explains better: the values between a wrong cut and the right one sit on another sheet. */
const OVERRIDABLE = new Set<Diagnosis['kind']>(['other-sheet', 'unexplained', 'inaccurate']);
/**
 * Labels a misplaced cut replaces: `unexplained` means no other label applies, and `inaccurate`
 * means right branch, which a value beyond a misplaced cut is not. Others (other-sheet, a zero
 * sign) stay after it.
 */
const REPLACED = new Set<Diagnosis['kind']>(['unexplained', 'inaccurate']);
/** An `inaccurate` point closer than this (relative) to the expected value is just inaccurate, even beside a wrong jump. */
const MERELY_INACCURATE = 1e-6;
const overridable = (labels: readonly Diagnosis[]): boolean => {
  const d = labels[0];
  return (
    d !== undefined && OVERRIDABLE.has(d.kind) && !(d.kind === 'inaccurate' && d.relativeError <= MERELY_INACCURATE)
  );
};

/**
 * Compares the jumps of the library's values along a continuous path with the jumps of the
 * expected values. Within each run of failing points, the steps where one jumps and the other
 * does not are paired in order; the points between a pair sit on another sheet because of a
 * misplaced cut, and get `misplaced-cut` as their leading label, with where the library jumped and
 * where it should have (mid-step values of t, null when there is no jump); their other labels stay
 * after it, except `unexplained` and `inaccurate` (REPLACED). A mismatch left unpaired
 * reaches to the nearer end of the run. A point keeps its own leading label when that is more
 * specific (zero-sign, cut-side, not-finite) or when it is merely inaccurate (within 1e-6 of the
 * expected value: a neighbour of the wrong jump, not beyond it). Pairing, rather than relabelling
 * the whole run, matters when every point fails for another reason (a library rotated onto
 * another sheet everywhere) and only one point is also on the wrong side of a cut.
 * Returns the labels to use, index by index (null for passing points).
 */
export function findMisplacedCuts(
  t: readonly number[],
  expected: readonly ComplexDouble[],
  actual: readonly ComplexDouble[],
  pointDiagnoses: readonly (readonly Diagnosis[] | null)[],
  /** The jumps of both, when the caller has them already (detectJumpsInColumns); then `expected` and `actual` are not read. */
  jumps?: { expected: ArrayLike<number | boolean>; actual: ArrayLike<number | boolean> },
): (Diagnosis[] | null)[] {
  const expectedJumps: ArrayLike<number | boolean> = jumps ? jumps.expected : detectJumps(expected);
  const actualJumps: ArrayLike<number | boolean> = jumps ? jumps.actual : detectJumps(actual);
  const result = pointDiagnoses.map((labels) => (labels ? [...labels] : null));
  const midT = (i: number) => (t[i]! + t[i + 1]!) / 2;
  const relabel = (from: number, to: number, steps: number[]) => {
    const libraryStep = steps.find((i) => Boolean(actualJumps[i]));
    const expectedStep = steps.find((i) => Boolean(expectedJumps[i]));
    const misplaced: Diagnosis = {
      kind: 'misplaced-cut',
      libraryJumpAt: libraryStep === undefined ? null : midT(libraryStep),
      expectedJumpAt: expectedStep === undefined ? null : midT(expectedStep),
    };
    for (let i = from; i <= to; i += 1) {
      const labels = result[i];
      if (labels && overridable(labels))
        result[i] = [misplaced, ...labels.filter((l) => !REPLACED.has(l.kind) && l.kind !== 'misplaced-cut')];
    }
  };
  for (let start = 0; start < result.length;) {
    if (!pointDiagnoses[start]) {
      start += 1;
      continue;
    }
    let end = start;
    while (end + 1 < result.length && pointDiagnoses[end + 1]) end += 1;
    // Steps touching the run, from the one entering it to the one leaving it, where the two disagree.
    const mismatched: number[] = [];
    for (let i = Math.max(0, start - 1); i <= Math.min(end, expectedJumps.length - 1); i += 1)
      if (Boolean(expectedJumps[i]) !== Boolean(actualJumps[i])) mismatched.push(i);
    for (let k = 0; k + 1 < mismatched.length; k += 2) {
      const a = mismatched[k]!;
      const b = mismatched[k + 1]!;
      relabel(a + 1, b, [a, b]);
    }
    if (mismatched.length % 2 === 1) {
      const m = mismatched[mismatched.length - 1]!;
      if (end - m <= m + 1 - start) relabel(m + 1, end, [m]);
      else relabel(start, m, [m]);
    }
    start = end + 1;
  }
  return result;
}
