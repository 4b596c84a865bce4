import type { Convention } from '../../shared/schemas/convention-schema';
import type { Tolerance } from '../../shared/schemas/tolerance-schema';
import type { Target } from '../adapters/target';
import type { PlaneCut } from '../cuts/plane-cut';
import type { SubjectExpr } from '../expressions/subject-expr';

/** What a law needs to check one run: the library, the subject, how strictly, and (for `root-power`) the power. */
export interface LawContext {
  target: Target;
  expr: SubjectExpr;
  convention: Convention;
  tolerance: Tolerance;
  cuts: readonly PlaneCut[] | null;
  power?: number;
}
