import type { ClassCounts, OutcomeCounts } from './run-result';
import type { RunStatus, RunTrigger } from './run-status';

/** A run as lists and the progress bar show it. */
export interface RunView {
  id: string;
  planId: string | null;
  planName: string;
  trigger: RunTrigger;
  status: RunStatus;
  shardsTotal: number;
  shardsDone: number;
  counts: OutcomeCounts;
  /** Failing points by class: branch findings (wrong sheet, side, zero sign, jump…) apart from accuracy ones. */
  byClass: ClassCounts;
  /**
   * Checks (one suite against one library version) stopped by an error, the run matrix's error
   * cells: an error outcome, or nothing judged (shared/check-stopped-by-error.ts). Every verdict reads it.
   */
  checksStopped: number;
  /**
   * Checks whose outcome is a failure: a failing point, a failed property law or a failed
   * monodromy check. With no failing point, only laws and monodromy checks failed, and the
   * verdict must say so rather than "all checked points passed".
   */
  checksFailed: number;
  regressions: number | null;
  /** Targets of queued pairs that no live worker has: those pairs wait until a worker that has one starts. */
  waitingFor: string[];
  requestedBy: string | null;
  createdAt: string;
  startedAt: string | null;
  finishedAt: string | null;
}
