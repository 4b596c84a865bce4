import type { Suite } from '../../shared/schemas/suite-schema';
import type { EvaluatePairOptions } from './evaluate-pair';
import type { Shard } from './plan';
import type { TargetRef } from './target-ref';

/** One shard as runPlan's loop hands it to a lane: what to evaluate, and how (evaluatePair's options). */
export interface ShardJob {
  shard: Shard;
  suite: Suite;
  ref: TargetRef;
  /** Points per path of the suite (the plan's), for an error result. */
  pathPoints: number[];
  evaluation: Pick<EvaluatePairOptions, 'maxFindings' | 'properties'> & { timeLimitMs: number };
}
