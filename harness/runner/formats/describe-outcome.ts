import { outcomeLabels } from '../../../shared/outcome-labels';
import type { PointOutcome } from '../../../shared/point-outcome';
import { describeLabel } from './describe-label';

/** One line for a point's outcome: every label of a failure, leading first ("zero-sign (output im) + inaccurate, 7 ulps in re, …"), or "error: …". */
export function describeOutcome(o: PointOutcome): string {
  switch (o.kind) {
    case 'pass':
      return 'pass';
    case 'skipped':
      return `skipped: ${o.reason}`;
    case 'error':
      return `error: ${o.message}`;
    case 'not-applicable':
      return `not applicable: ${o.reason}`;
    case 'fail':
      return outcomeLabels(o).map(describeLabel).join(' + ');
  }
}
