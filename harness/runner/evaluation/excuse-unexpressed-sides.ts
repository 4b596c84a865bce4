import type { Diagnosis } from '../../../shared/diagnosis';
import type { PathRun } from './path-run';

/**
 * Through an entry that cannot carry the sign of a zero imaginary part (a plain number), a point
 * exactly on a cut along the real axis has no side: the library gets `x`, not `x + 0i` or
 * `x − 0i`, and whichever side it answers with is its choice, not a lost sign. A failure there
 * whose one label is the sign of the input's imaginary zero (the library's value is the one the
 * other sign gives) is therefore not applicable to the entry, with that reason, and leaves the
 * failures. A point with other labels there (another sheet, an inaccurate value) stays a
 * failure with those labels, without that one. Runs
 * after diagnoseFailures and before compareAlongPath and listFindings, which read `failing`.
 */
export function excuseUnexpressedSides(run: PathRun): void {
  if (run.entry.carries.imaginaryZeroSign || run.suite.convention !== 'signed-zero') return;
  const reason = `the ${run.entry.name} entry (${run.entry.call}) cannot say which side of the cut the point is on: only the sign of its zero imaginary part picks the side`;
  const kept: number[] = [];
  const unexpressed = (d: Diagnosis): boolean => d.kind === 'zero-sign' && d.part === 'im' && d.of === 'input';
  for (const i of run.failing) {
    const labels = run.labels[i] ?? [];
    if (labels.length > 0 && labels.every(unexpressed)) {
      run.notApplicable.set(i, reason);
      run.outcomes[i] = { kind: 'not-applicable', reason };
      run.labels[i] = null;
      run.out.counts.notApplicable++;
      continue;
    }
    // Other labels stand on their own; the sign the entry could not send is not one of them.
    if (labels.some(unexpressed)) run.labels[i] = labels.filter((d) => !unexpressed(d));
    kept.push(i);
  }
  run.out.counts.fail = kept.length;
  run.failing.splice(0, run.failing.length, ...kept);
}
