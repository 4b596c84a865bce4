import type { SuiteTargetResult } from '../../shared/run-result';
import type { Suite } from '../../shared/schemas/suite-schema';
import type { TargetInfo } from '../adapters/target-info';
import type { ShardJob } from './shard-job';
import type { CacheRecords } from './reference-cache';
import type { TargetRef } from './target-ref';

/** Main thread → shard worker: a shard with evaluatePair's options, a cancellation with its reason, or the end. */
export type WorkerRequest =
  | {
      type: 'shard';
      shard: number;
      suite: Suite;
      paths: number[];
      pathPoints: number[];
      target: TargetInfo & { spec: NonNullable<TargetRef['worker']> };
      evaluation: ShardJob['evaluation'];
    }
  | { type: 'abort'; reason: string }
  | { type: 'close' };

/** Shard worker → main thread: a result (an error result too) with the reference values it computed, or a failure. */
export type WorkerReply =
  | { type: 'ready' }
  | { type: 'result'; shard: number; result: SuiteTargetResult; records: CacheRecords[] }
  | { type: 'failed'; shard: number; error: string };
