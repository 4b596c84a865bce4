import type { OutcomeCounts } from './run-result';

/**
 * The points of a check that were judged, passed or failed: none means the check checked nothing,
 * whatever its scope (`checked`) says it was to cover (a check whose target lacks the function
 * keeps its suite's paths and points there, every one skipped).
 */
export function judgedPoints(check: { counts: OutcomeCounts | null }): number {
  return (check.counts?.pass ?? 0) + (check.counts?.fail ?? 0);
}
