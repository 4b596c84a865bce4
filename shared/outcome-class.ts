import type { DiagnosisClass } from './diagnosis-class';
import { outcomeLabels } from './outcome-labels';
import type { PointOutcome } from './point-outcome';
import { pointClass } from './point-class';

/** The class of a point's outcome (point-class.ts from its labels); null for an outcome that is not a failure. */
export function outcomeClass(outcome: PointOutcome): DiagnosisClass | null {
  return outcome.kind === 'fail' ? pointClass(outcomeLabels(outcome)) : null;
}
