/** Points `from`..`to` lie between a wrong jump and the right one; `steps` are the mismatched steps that bound them. */
export interface MisplacedCutGroup {
  from: number;
  to: number;
  steps: number[];
}

/**
 * Where a misplaced cut may explain failures along a continuous path: within each run of failing
 * points, the steps where the library's values jump and the expected ones do not (or the reverse)
 * are paired in order, and the points between a pair form a group; a mismatch left unpaired reaches
 * to the nearer end of the run, or across the whole run when it lies on the run's edge. Pairing, rather than taking the whole run, matters when every
 * point fails for another reason (a library rotated onto another sheet everywhere) and only one
 * point is also on the wrong side of a cut. The steps are what refinement must confirm
 * (harness/runner/evaluation/confirm-jumps.ts) before the group is called a misplaced cut.
 */
export function misplacedCutGroups(
  /** Each point's labels, null where it passed. */
  pointDiagnoses: readonly (readonly unknown[] | null)[],
  expectedJumps: ArrayLike<number | boolean>,
  actualJumps: ArrayLike<number | boolean>,
): MisplacedCutGroup[] {
  const groups: MisplacedCutGroup[] = [];
  for (let start = 0; start < pointDiagnoses.length;) {
    if (!pointDiagnoses[start]) {
      start += 1;
      continue;
    }
    let end = start;
    while (end + 1 < pointDiagnoses.length && pointDiagnoses[end + 1]) end += 1;
    // Steps touching the run, from the one entering it to the one leaving it, where the two disagree.
    const mismatched: number[] = [];
    for (let i = Math.max(0, start - 1); i <= Math.min(end, expectedJumps.length - 1); i += 1)
      if (Boolean(expectedJumps[i]) !== Boolean(actualJumps[i])) mismatched.push(i);
    for (let k = 0; k + 1 < mismatched.length; k += 2) {
      const a = mismatched[k]!;
      const b = mismatched[k + 1]!;
      groups.push({ from: a + 1, to: b, steps: [a, b] });
    }
    if (mismatched.length % 2 === 1) {
      const m = mismatched[mismatched.length - 1]!;
      // The nearer side, unless it is empty: a mismatch on the step entering the run (m = start − 1)
      // or leaving it (m = end) puts the whole run on one side.
      const after = end - m;
      const before = m + 1 - start;
      groups.push(
        after > 0 && (after <= before || before === 0)
          ? { from: m + 1, to: end, steps: [m] }
          : { from: start, to: m, steps: [m] },
      );
    }
    start = end + 1;
  }
  return groups;
}
