import { decisionState } from '../../shared/decision-state';
import type { DecisionView } from '../../shared/decision-view';
import type { Deviation } from '../entities/deviation';

/** A stored decision (with its author loaded) as the API shows it, its state taken now. */
export function toDecisionView(d: Deviation): DecisionView {
  const expiresAt = d.expiresAt?.toISOString() ?? null;
  const revokedAt = d.revokedAt?.toISOString() ?? null;
  return {
    id: d.id,
    classification: d.classification,
    scope: d.scope,
    versions: d.versions,
    targetKey: d.targetKey,
    targetVersion: d.targetVersion,
    suiteSlug: d.suiteSlug,
    pathName: d.pathName,
    pointKey: d.pointKey,
    diagnosisKind: d.diagnosisKind,
    reason: d.reason,
    expiresAt,
    failureId: d.failureId,
    createdBy: d.createdBy.displayName,
    createdAt: d.createdAt.toISOString(),
    revokedAt,
    state: decisionState({ expiresAt, revokedAt }),
  };
}
