import type { SuitePath } from '../../../shared/schemas/suite-path-schema';
import type { Suite } from '../../../shared/schemas/suite-schema';
import type { TargetEntry } from '../../../shared/target-entry';
import type { Target } from '../../adapters/target';
import type { PathPoint } from '../../paths/path-point';
import type { Expectation } from '../expectations/expectation';
import type { ReferenceCache } from '../reference-cache/reference-cache';
import type { SubjectProgram } from './subject-program';
import type { SuiteCounterpart } from './suite-counterpart';

/** What evaluating one path of a suite against one target needs. */
export interface PathEvaluation {
  suite: Suite;
  cache: ReferenceCache;
  /** The suite's key in the reference cache. */
  cacheKey: string;
  target: Target;
  /** The entry the path's inputs go in through: the path's, else the suite's, else the target's default. */
  entry: TargetEntry;
  program: SubjectProgram;
  expectation: Expectation;
  path: SuitePath;
  /** The path's points, or why it could not be built. */
  points: PathPoint[] | Error;
  /** Operations of the subject the target does not have: every point is then skipped. */
  unsupported: string[];
  /** The suite's counterparts against this target (prepare-counterparts.ts); empty when it has none. */
  counterparts: SuiteCounterpart[];
  /**
   * When the target states a convention other than the suite's: the suite's expectation under the
   * target's convention, so the points where the two conventions differ are not applicable
   * (convention-mismatch-reason.ts, which words `reason` once for the pair). Absent otherwise.
   */
  targetConvention?: { expectation: Expectation; cacheKey: string; reason: string };
  /** Failing points listed in full (all are counted). */
  maxFindings: number;
  signal?: AbortSignal;
}
