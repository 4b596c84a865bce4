import type { DecisionState } from './decision-state';
import type { DecisionVersions } from './decision-versions';
import type { ClassifyBody } from './schemas/classify-body';

/**
 * A decision (a row of `deviations`) as GET /api/deviations lists it and the case page shows the
 * ones that apply to its failure: the verdict, its scope (suite, and the path, point or diagnosis
 * the scope names; the library and which of its versions), who gave it and when, until when, and
 * where it stands (`state`, from shared/decision-state.ts at the time of the answer).
 */
export interface DecisionView {
  id: string;
  classification: ClassifyBody['classification'];
  scope: ClassifyBody['scope'];
  versions: DecisionVersions;
  /** The library without its version ("complex.js", "mathjs/number"). */
  targetKey: string;
  /** The version the decision was given on; null for decisions recorded before versions were stored. */
  targetVersion: string | null;
  suiteSlug: string;
  pathName: string | null;
  pointKey: string | null;
  diagnosisKind: string | null;
  reason: string;
  expiresAt: string | null;
  failureId: string | null;
  createdBy: string;
  createdAt: string;
  revokedAt: string | null;
  state: DecisionState;
}
