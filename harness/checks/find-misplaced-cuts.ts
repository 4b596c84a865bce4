import type { Diagnosis } from '../../shared/diagnosis';
import type { ComplexDouble } from './complex-double';
import { detectJumps } from './detect-jumps';

/** Point-level diagnoses that a wrong jump explains better: the values between a wrong cut and the right one sit on another sheet. */
const OVERRIDABLE = new Set<Diagnosis['kind']>(['other-sheet', 'unexplained', 'inaccurate']);
/** An `inaccurate` point closer than this (relative) to the expected value is just inaccurate, even beside a wrong jump. */
const MERELY_INACCURATE = 1e-6;
const overridable = (d: Diagnosis): boolean => OVERRIDABLE.has(d.kind) && !(d.kind === 'inaccurate' && d.relativeError <= MERELY_INACCURATE);

/**
 * Compares the jumps of the library's values along a continuous path with the jumps of the
 * expected values. Every run of failing points that touches a step where one jumps and the
 * other does not is a misplaced cut; its points are re-diagnosed `misplaced-cut` with where the
 * library jumped and where it should have (mid-step values of t, null when there is no jump),
 * unless a point's own diagnosis is more specific (zero-sign, cut-side, not-finite) or it is
 * merely inaccurate (within 1e-6 of the expected value: a neighbour of the wrong jump, not beyond it).
 * Returns the diagnoses to use, index by index (null for passing points).
 */
export function findMisplacedCuts(
  t: readonly number[],
  expected: readonly ComplexDouble[],
  actual: readonly ComplexDouble[],
  pointDiagnoses: readonly (Diagnosis | null)[],
): (Diagnosis | null)[] {
  const expectedJumps = detectJumps(expected);
  const actualJumps = detectJumps(actual);
  const result = [...pointDiagnoses];
  const midT = (i: number) => (t[i]! + t[i + 1]!) / 2;
  for (let start = 0; start < result.length; ) {
    if (!pointDiagnoses[start]) {
      start += 1;
      continue;
    }
    let end = start;
    while (end + 1 < result.length && pointDiagnoses[end + 1]) end += 1;
    // Steps touching the run: from the one entering it to the one leaving it.
    const steps: number[] = [];
    for (let i = Math.max(0, start - 1); i <= Math.min(end, expectedJumps.length - 1); i += 1) steps.push(i);
    if (steps.some((i) => expectedJumps[i] !== actualJumps[i])) {
      const libraryStep = steps.find((i) => actualJumps[i]);
      const expectedStep = steps.find((i) => expectedJumps[i]);
      const misplaced: Diagnosis = {
        kind: 'misplaced-cut',
        libraryJumpAt: libraryStep === undefined ? null : midT(libraryStep),
        expectedJumpAt: expectedStep === undefined ? null : midT(expectedStep),
      };
      for (let i = start; i <= end; i += 1) if (overridable(result[i]!)) result[i] = misplaced;
    }
    start = end + 1;
  }
  return result;
}
