import type { Suite } from '../../../shared/schemas/suite-schema';
import type { TargetDescriptor } from '../../adapters/target-descriptor';
import type { EvaluatePairOptions } from '../evaluation/evaluate-pair';
import type { Slice } from './plan';

/** One slice as runPlan's loop hands it to a lane: what to evaluate, and how (evaluatePair's options). */
export interface SliceJob {
  slice: Slice;
  suite: Suite;
  descriptor: TargetDescriptor;
  /** Points per path of the suite (the plan's), for an error result. */
  pathPoints: number[];
  evaluation: Pick<EvaluatePairOptions, 'maxFindings' | 'properties'> & { timeLimitMs: number };
}
