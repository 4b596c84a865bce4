import { judgedPoints } from './judged-points';
import type { OutcomeCounts } from './run-result';

/**
 * Whether a check (one suite against one library version, a shard) was stopped by an error: its
 * outcome is an error, or it is done and judged no point (every point skipped because the library
 * lacks the function, or in error). The one rule behind the run matrix's error cells, the run's
 * stored count `checks_stopped` (summed by the shard executor) and so every run verdict: a run
 * whose checks checked nothing must never read "all checked points passed".
 */
export function checkStoppedByError(check: {
  status: 'queued' | 'running' | 'done' | 'cancelled';
  outcome: 'pass' | 'fail' | 'error' | null;
  counts: OutcomeCounts | null;
}): boolean {
  return check.outcome === 'error' || (check.status === 'done' && judgedPoints(check) === 0);
}
