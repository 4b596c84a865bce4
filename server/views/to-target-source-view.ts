import type { TargetSourceView } from '../../shared/target-source-view';
import type { TargetSourceRow } from '../entities/target-source-row';

/** A stored target source as the API shows it (`addedBy` loaded). */
export function toTargetSourceView(row: TargetSourceRow): TargetSourceView {
  return {
    id: row.id,
    source: row.source,
    state: row.state,
    targetNames: row.targets.map((t) => t.name),
    error: row.error,
    addedBy: row.addedBy?.displayName ?? null,
    addedAt: row.addedAt.toISOString(),
    resolvedAt: row.resolvedAt?.toISOString() ?? null,
  };
}
