import { NOTHING_CHECKED, pairStatus } from '../evaluation/pair-status';
import { addTally } from '../evaluation/add-tally';
import { emptyClassCounts } from '../evaluation/empty-class-counts';
import { emptyCounts } from '../evaluation/empty-counts';
import type { SuiteTargetResult } from '../../../shared/run-result';

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
    counts: emptyCounts(),
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
    addTally(merged, result);
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
