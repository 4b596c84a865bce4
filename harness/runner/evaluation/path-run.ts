import type { Diagnosis } from '../../../shared/diagnosis';
import type { PointOutcome } from '../../../shared/point-outcome';
import type { PathResult, PointFinding } from '../../../shared/run-result';
import type { PathPoint } from '../../paths/path-point';
import type { ExpectedColumn, PointAlternatives } from '../expectations/expectation';
import type { PathEvaluation } from './path-evaluation';
import type { ValueColumn } from './value-column';

/** One path's evaluation under way: its inputs, both value columns, and what the steps have found so far. */
export interface PathRun extends PathEvaluation {
  points: PathPoint[];
  /** The points column-wise, with their t. */
  inputs: { re: Float64Array; im: Float64Array; t: number[] };
  expected: ExpectedColumn;
  actual: ValueColumn;
  /** The result being filled in. */
  out: PathResult;
  /** Points the entry cannot express (inexpressible-reason.ts), with why: not applicable, never evaluated as failures. */
  notApplicable: Map<number, string>;
  /** Skipped points by reason. */
  skipReasons: Map<string, number>;
  /** Each point's outcome when it did not simply pass. */
  outcomes: (PointOutcome | null)[];
  failing: number[];
  errored: number[];
  /** Each failing point's labels, the leading one first (diagnoseFailure, findMisplacedCuts); null elsewhere. */
  labels: (Diagnosis[] | null)[];
  /** The alternatives computed for a failure's diagnosis, by point. */
  alternatives: Map<number, PointAlternatives>;
  /** By failing point: a composed subject's steps beside the reference's, and the choice its expected value rests on (trace-steps.ts). */
  traces: Map<number, Pick<PointFinding, 'steps' | 'firstLeftStep' | 'choice'>>;
  /** Failing points where a step before the last lost an exact zero of the reference first (trace-steps.ts). */
  zeroLostBefore: Set<number>;
}
