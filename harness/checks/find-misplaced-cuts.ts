import type { Diagnosis } from '../../shared/diagnosis';
import type { ComplexDouble } from './complex-double';
import { detectJumps } from './detect-jumps';
import { misplacedCutGroups } from './misplaced-cut-groups';

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
 * expected values. The points between a step where one jumps and the other does not and its
 * partner (misplaced-cut-groups.ts) sit on another sheet because of a misplaced cut, and get
 * `misplaced-cut` as their leading label, with where the library jumped and where it should have
 * (mid-step values of t, null when there is no jump); their other labels stay after it, except
 * `unexplained` and `inaccurate` (REPLACED). A point keeps its own leading label when that is more
 * specific (zero-sign, cut-side, not-finite) or when it is merely inaccurate (within 1e-6 of the
 * expected value: a neighbour of the wrong jump, not beyond it).
 *
 * With `confirmed` (the steps whose jump refinement between the samples confirmed:
 * harness/runner/evaluation/confirm-jumps.ts), a group is relabelled only when every step that
 * bounds it is confirmed, and its label says `confirmed: true`; the points of a group whose jump
 * did not survive refinement (a steep but continuous stretch) keep their own labels.
 * Returns the labels to use, index by index (null for passing points).
 */
export function findMisplacedCuts(
  t: readonly number[],
  expected: readonly ComplexDouble[],
  actual: readonly ComplexDouble[],
  pointDiagnoses: readonly (readonly Diagnosis[] | null)[],
  /** The jumps of both, when the caller has them already (detectJumpsInColumns); then `expected` and `actual` are not read. */
  jumps?: { expected: ArrayLike<number | boolean>; actual: ArrayLike<number | boolean> },
  confirmed?: ReadonlySet<number>,
): (Diagnosis[] | null)[] {
  const expectedJumps: ArrayLike<number | boolean> = jumps ? jumps.expected : detectJumps(expected);
  const actualJumps: ArrayLike<number | boolean> = jumps ? jumps.actual : detectJumps(actual);
  const result = pointDiagnoses.map((labels) => (labels ? [...labels] : null));
  const midT = (i: number) => (t[i]! + t[i + 1]!) / 2;
  for (const { from, to, steps } of misplacedCutGroups(pointDiagnoses, expectedJumps, actualJumps)) {
    if (confirmed && !steps.every((s) => confirmed.has(s))) continue;
    const libraryStep = steps.find((i) => Boolean(actualJumps[i]));
    const expectedStep = steps.find((i) => Boolean(expectedJumps[i]));
    const misplaced: Diagnosis = {
      kind: 'misplaced-cut',
      libraryJumpAt: libraryStep === undefined ? null : midT(libraryStep),
      expectedJumpAt: expectedStep === undefined ? null : midT(expectedStep),
      ...(confirmed ? { confirmed: true } : {}),
    };
    for (let i = from; i <= to; i += 1) {
      const labels = result[i];
      if (labels && overridable(labels))
        result[i] = [misplaced, ...labels.filter((l) => !REPLACED.has(l.kind) && l.kind !== 'misplaced-cut')];
    }
  }
  return result;
}
