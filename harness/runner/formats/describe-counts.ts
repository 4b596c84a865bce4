import type { DiagnosisKind } from '../../../shared/diagnosis';
import type { ClassCounts, OutcomeCounts } from '../../../shared/run-result';
import { describeLabelCounts } from './describe-label-counts';

/**
 * Counts in words, branch findings first: "6774 pass · 1073 fail (257 branch, 816 accuracy) ·
 * 0 error · 788 skipped", and with `byDiagnosis` the labels by class (describeLabelCounts) in
 * brackets. A point with two labels counts under both labels; the fail count counts it once,
 * under its class (a point with any branch label is a branch finding).
 */
export function describeCounts(
  counts: OutcomeCounts,
  byClass: ClassCounts,
  byDiagnosis?: Partial<Record<DiagnosisKind, number>>,
  separator = ' · ',
): string {
  const fail =
    counts.fail > 0 ? `${counts.fail} fail (${byClass.branch} branch, ${byClass.accuracy} accuracy)` : '0 fail';
  const parts = [`${counts.pass} pass`, fail, `${counts.error} error`, `${counts.skipped} skipped`];
  if (counts.notApplicable > 0) parts.push(`${counts.notApplicable} not applicable`);
  const labels = byDiagnosis ? describeLabelCounts(byDiagnosis) : '';
  return `${parts.join(separator)}${labels ? ` [${labels}]` : ''}`;
}
