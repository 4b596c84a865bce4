import type { SuiteTargetResult } from '../../../shared/run-result';
import type { SliceJob } from './slice-job';

/**
 * Where runPlan's loop evaluates its slices, one at a time: this process (in-process-lane.ts)
 * or one worker thread (worker-lane.ts). `run` always answers a result — an error result when
 * the evaluation failed, ran out of time or was cancelled by `signal` — and never throws.
 */
export interface SliceLane {
  run(job: SliceJob, signal: AbortSignal): Promise<SuiteTargetResult>;
  /** Closes what the lane holds (open targets, its worker). */
  close(): Promise<void>;
}
