import type { DiagnosisKind } from '../../../shared/diagnosis';
import type { OutcomeCounts, PathResult } from '../../../shared/run-result';

/** What a path, a suite × target pair and a run each count: outcomes, labels, and failing points by class. */
type Tally = Pick<PathResult, 'counts' | 'byDiagnosis' | 'byClass'>;

/** Adds `from`'s counts, label counts and class counts into `into` (paths into a pair, slices into a pair, pairs into a run). */
export function addTally(into: Tally, from: Tally): void {
  for (const k of Object.keys(into.counts) as (keyof OutcomeCounts)[]) into.counts[k] += from.counts[k] ?? 0;
  for (const [kind, n] of Object.entries(from.byDiagnosis))
    into.byDiagnosis[kind as DiagnosisKind] = (into.byDiagnosis[kind as DiagnosisKind] ?? 0) + (n ?? 0);
  into.byClass.branch += from.byClass.branch;
  into.byClass.accuracy += from.byClass.accuracy;
}
