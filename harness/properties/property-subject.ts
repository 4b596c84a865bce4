import type { Convention } from '../../shared/schemas/convention-schema';
import type { Tolerance } from '../../shared/schemas/tolerance-schema';
import type { PlaneCut } from '../cuts/plane-cut';
import type { SubjectExpr } from '../expressions/subject-expr';

/** What a property check runs on: the suite's subject (text and parsed), its expected cuts, convention and property tolerance. */
export interface PropertySubject {
  text: string;
  expr: SubjectExpr;
  cuts: readonly PlaneCut[] | null;
  convention: Convention;
  tolerance: Tolerance;
}
