import { diagnosisClass, type DiagnosisClass } from './diagnosis-class';
import { outcomeLabels } from './outcome-labels';
import type { PointOutcome } from './point-outcome';

/** The class of a failing point: branch when any of its labels is a branch label, else accuracy; null for other outcomes. */
export function outcomeClass(outcome: PointOutcome): DiagnosisClass | null {
  if (outcome.kind !== 'fail') return null;
  return outcomeLabels(outcome).some((l) => diagnosisClass(l.kind) === 'branch') ? 'branch' : 'accuracy';
}
