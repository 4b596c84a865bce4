import type { RunMatrixCell } from '../../shared/run-matrix-cell';

/**
 * The points of a check that were judged, passed or failed: none means the check checked nothing,
 * whatever its scope (`checked`) says it was to cover (a check whose target lacks the function
 * keeps its suite's paths and points there, every one skipped).
 */
export function judgedPoints(cell: Pick<RunMatrixCell, 'counts'>): number {
  return (cell.counts?.pass ?? 0) + (cell.counts?.fail ?? 0);
}
