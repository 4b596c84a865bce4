import type { SuiteTargetResult } from '../../../shared/run-result';
import type { Suite } from '../../../shared/schemas/suite-schema';
import type { TargetIdentity } from '../../../shared/target-identity';
import type { TargetDescriptor } from '../../adapters/target-descriptor';
import type { SliceJob } from '../plan/slice-job';
import type { CacheRecords } from '../reference-cache/reference-cache';

/** Main thread → slice worker: a slice with evaluatePair's options, a cancellation with its reason, or the end. */
export type WorkerRequest =
  | {
      type: 'slice';
      slice: number;
      suite: Suite;
      paths: number[];
      pathPoints: number[];
      target: TargetIdentity & { spec: NonNullable<TargetDescriptor['worker']> };
      evaluation: SliceJob['evaluation'];
    }
  | { type: 'abort'; reason: string }
  | { type: 'close' };

/** Slice worker → main thread: a result (an error result too) with the reference values it computed, or a failure. */
export type WorkerReply =
  | { type: 'ready' }
  | { type: 'result'; slice: number; result: SuiteTargetResult; records: CacheRecords[] }
  | { type: 'failed'; slice: number; error: string };
