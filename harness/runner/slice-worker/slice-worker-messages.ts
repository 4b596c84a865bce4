import type { SuiteTargetResult } from '../../../shared/run-result';
import type { Suite } from '../../../shared/schemas/suite-schema';
import type { CacheRecords } from '../reference-cache/reference-cache';
import type { TargetRef } from '../plan/target-ref';

/** Main thread → shard worker. */
export type WorkerRequest =
  | {
      type: 'shard';
      shard: number;
      suite: Suite;
      paths: number[];
      target: { name: string; spec: NonNullable<TargetRef['worker']> };
      maxFindings?: number;
    }
  | { type: 'abort' }
  | { type: 'close' };

/** Shard worker → main thread: a result with the reference values it computed, a failure, or that it has aborted. */
export type WorkerReply =
  | { type: 'ready' }
  | { type: 'result'; shard: number; result: SuiteTargetResult; records: CacheRecords[] }
  | { type: 'failed'; shard: number; error: string }
  | { type: 'aborted' };
