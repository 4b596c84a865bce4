import type { DiagnosisKind } from './diagnosis';
import type { CheckedScope, ClassCounts, OutcomeCounts } from './run-result';
import type { SkipReason } from './skip-reason';

/**
 * One suite × target cell of a run's matrix (`GET /api/runs/:id/matrix`). `counts`, `byClass`, `byDiagnosis`
 * and `checked` stay null until the shard is done; `outcome` is null until then too.
 */
export interface RunMatrixCell {
  suite: string;
  target: string;
  status: 'queued' | 'running' | 'done' | 'cancelled';
  outcome: 'pass' | 'fail' | 'error' | null;
  counts: OutcomeCounts | null;
  /** Failing points by class, branch first (null until done, as `counts`). */
  byClass: ClassCounts | null;
  byDiagnosis: Partial<Record<DiagnosisKind, number>> | null;
  checked: CheckedScope | null;
  /** The last worker that took the pair ("host:pid"), kept when it is taken again; null until one has. */
  worker: string | null;
  /** Queued, and no live worker has its target: it waits, for as long as it takes, until one that has it starts. */
  noWorkerHasTarget: boolean;
  /** Shard-level errors: a target that hung or crashed, a suite that could not be evaluated. */
  errors: string[];
  /** Why points were skipped, summed over the pair's paths, most points first (empty until done). */
  skipReasons: SkipReason[];
  /**
   * Checks beyond the points that failed: property laws (the run's property checks say which and
   * where) and the names of paths whose monodromy check failed (the value continued once around
   * the path is not the expected multiple of the start value). A pair can fail on these alone,
   * with every point passed: its outcome is then `fail`, and its cell must not read as passed.
   */
  lawsFailed: number;
  loopsFailed: string[];
}
