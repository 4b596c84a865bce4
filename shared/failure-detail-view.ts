import type { DecisionView } from './decision-view';
import type { DiagnosisKind } from './diagnosis';
import type { FailureView } from './failure-view';

/** GET /api/failures/:id: the failure in full, the same point (suite, path, input bits) in every run, newest first, and the decisions on it. */
export interface FailureDetailView {
  failure: FailureView;
  /** The failure's library without its version ("complex.js") and the version it ran (a decision's scope names both). */
  targetKey: string;
  targetVersion: string;
  history: {
    id: string;
    runId: string;
    runAt: string;
    targetName: string;
    targetVersion: string;
    diagnosisKind: DiagnosisKind | null;
    isRegression: boolean;
  }[];
  /** The decisions that apply to this failure (its scope and version), in force or expired, newest first. */
  decisions: DecisionView[];
}
