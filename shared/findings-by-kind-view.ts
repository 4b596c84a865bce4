import type { DiagnosisKind } from './diagnosis';

/**
 * A plan's findings by diagnosis kind across its latest completed runs, oldest first. A failing
 * point is counted under each of its labels (shared/point-outcome.ts), as the failure table's
 * `diagnosis` filter matches any label, so a run's count of a kind is the number of rows that
 * filter shows; `failed` counts each failing point once.
 */
export interface FindingsByKindView {
  runs: {
    id: string;
    createdAt: string;
    finishedAt: string | null;
    failed: number;
    /** Checks of the run stopped by an error (the run view's `checksStopped`): they checked nothing, so count nothing here. */
    checksStopped: number;
    /** Every kind, 0 where the run has none. */
    byKind: Record<DiagnosisKind, number>;
  }[];
  /** The number of runs asked for: fewer came back when the plan has fewer completed runs. */
  limit: number;
}
