import type { DiagnosisKind } from './diagnosis';
import type { FailureView } from './failure-view';

/** GET /api/failures/:id: the failure in full and the same point (suite, path, input bits) in every run, newest first. */
export interface FailureDetailView {
  failure: FailureView;
  history: {
    id: string;
    runId: string;
    runAt: string;
    targetName: string;
    targetVersion: string;
    diagnosisKind: DiagnosisKind | null;
    isRegression: boolean;
  }[];
}
