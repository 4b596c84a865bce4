import { NOTHING_CHECKED, pairStatus } from '../evaluation/pair-status';
import { emptyClassCounts } from '../evaluation/empty-class-counts';
import type { DiagnosisKind } from '../../../shared/diagnosis';
import type { OutcomeCounts, SuiteTargetResult } from '../../../shared/run-result';

/**
 * Joins the slice results of one suite × target pair into one result: paths in the suite's
 * order, counts, diagnoses, errors and reference figures summed, the property checks as the
 * first slice ran them, and the status decided again (error before fail before pass; cancelled
 * when any slice was).
 */
export function mergePairResults(
  parts: { paths: number[]; result: SuiteTargetResult }[],
  totalPaths: number,
  totalPoints: number,
): SuiteTargetResult {
  const sorted = [...parts].sort((a, b) => (a.paths[0] ?? 0) - (b.paths[0] ?? 0));
  const first = sorted[0]?.result as SuiteTargetResult;
  const merged: SuiteTargetResult = {
    ...first,
    checked: { ...first.checked, paths: totalPaths, points: totalPoints },
    counts: { pass: 0, fail: 0, error: 0, skipped: 0, notApplicable: 0 },
    byDiagnosis: {},
    byClass: emptyClassCounts(),
    paths: [],
    errors: [],
    durationMs: 0,
    reference: { computed: 0, cached: 0 },
  };
  let cancelled = false;
  for (const { result } of sorted) {
    merged.paths.push(...result.paths);
    for (const k of Object.keys(merged.counts) as (keyof OutcomeCounts)[]) merged.counts[k] += result.counts[k];
    for (const [kind, n] of Object.entries(result.byDiagnosis))
      merged.byDiagnosis[kind as DiagnosisKind] = (merged.byDiagnosis[kind as DiagnosisKind] ?? 0) + (n ?? 0);
    merged.byClass.branch += result.byClass.branch;
    merged.byClass.accuracy += result.byClass.accuracy;
    merged.errors.push(...result.errors);
    merged.durationMs += result.durationMs;
    merged.reference.computed += result.reference.computed;
    merged.reference.cached += result.reference.cached;
    if (result.status === 'cancelled') cancelled = true;
  }
  merged.errors = merged.errors.filter((e) => e !== NOTHING_CHECKED);
  merged.status = pairStatus(merged, cancelled);
  return merged;
}
