import type { Diagnosis } from './diagnosis';
import type { PointOutcome } from './point-outcome';

/** Every label of a failing point, the leading one first; one label for rows stored before there were several; none for other outcomes. */
export function outcomeLabels(outcome: PointOutcome): Diagnosis[] {
  if (outcome.kind !== 'fail') return [];
  return outcome.labels && outcome.labels.length > 0 ? outcome.labels : [outcome.diagnosis];
}
