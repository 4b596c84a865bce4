import type { SuiteTargetResult } from '../../../shared/run-result';
import type { Suite } from '../../../shared/schemas/suite-schema';
import type { CacheRecords } from '../reference-cache/reference-cache';
import type { TargetDescriptor } from '../../adapters/target-descriptor';

/** Main thread → slice worker. */
export type WorkerRequest =
  | {
      type: 'slice';
      slice: number;
      suite: Suite;
      paths: number[];
      target: { name: string; spec: NonNullable<TargetDescriptor['worker']> };
      maxFindings?: number;
    }
  | { type: 'abort' }
  | { type: 'close' };

/** Slice worker → main thread: a result with the reference values it computed, a failure, or that it has aborted. */
export type WorkerReply =
  | { type: 'ready' }
  | { type: 'result'; slice: number; result: SuiteTargetResult; records: CacheRecords[] }
  | { type: 'failed'; slice: number; error: string }
  | { type: 'aborted' };
