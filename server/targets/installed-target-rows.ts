import type { TargetIdentity } from '../../shared/target-identity';
import type { TargetRow } from '../entities/target-row';

/** The `targets` rows that record these targets as installed, seen at `seenAt` (for an upsert on name). */
export function installedTargetRows(identities: TargetIdentity[], seenAt: Date): TargetRow[] {
  return identities.map(({ name, library, version, settings }) => ({
    name,
    library,
    version,
    settings,
    installed: true,
    lastSeenAt: seenAt,
  }));
}
