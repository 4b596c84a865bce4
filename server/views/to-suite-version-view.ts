import type { SuiteVersionView } from '../../shared/suite-version-view';
import type { SuiteVersion } from '../entities/suite-version';

/** The API view of a version; `suite`, `author`, `takenOverFrom` and `reviewer` must be loaded. */
export function toSuiteVersionView(v: SuiteVersion): SuiteVersionView {
  return {
    id: v.id,
    suiteId: v.suite.id,
    slug: v.suite.slug,
    version: v.version,
    status: v.status,
    body: v.body,
    author: { id: v.author.id, displayName: v.author.displayName },
    takenOverFrom: v.takenOverFrom ? { id: v.takenOverFrom.id, displayName: v.takenOverFrom.displayName } : null,
    reviewer: v.reviewer ? { id: v.reviewer.id, displayName: v.reviewer.displayName } : null,
    reviewComment: v.reviewComment,
    createdAt: v.createdAt.toISOString(),
    submittedAt: v.submittedAt?.toISOString() ?? null,
    reviewedAt: v.reviewedAt?.toISOString() ?? null,
  };
}
