import { diagnosisClass, type DiagnosisClass } from './diagnosis-class';
import type { Diagnosis } from './diagnosis';

/**
 * The class of a failing point from its labels: a point with any branch label is a branch
 * finding, one with only accuracy labels an accuracy finding (run-result.ts ClassCounts); null
 * for a point without labels (an error, a skipped point).
 */
export function pointClass(labels: readonly Diagnosis[]): DiagnosisClass | null {
  if (labels.length === 0) return null;
  return labels.some((l) => diagnosisClass(l.kind) === 'branch') ? 'branch' : 'accuracy';
}
