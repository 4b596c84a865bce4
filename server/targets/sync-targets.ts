import type { DataSource } from 'typeorm';
import { discoverTargets } from '../../harness';
import type { TargetIdentity } from '../../shared/target-identity';
import { TargetRow } from '../entities/target-row';

/**
 * Records the targets installed on this machine (loading no library) and marks the ones
 * no longer found as not installed, so plans keep naming them and say so. Returns the count.
 */
export async function syncTargets(
  dataSource: DataSource,
  found: TargetIdentity[] = discoverTargets(),
): Promise<number> {
  const now = new Date();
  await dataSource.transaction(async (tx) => {
    await tx.query('UPDATE targets SET installed = false');
    if (found.length > 0) {
      await tx.getRepository(TargetRow).upsert(
        found.map((t) => ({
          name: t.name,
          library: t.library,
          version: t.version,
          settings: t.settings,
          installed: true,
          lastSeenAt: now,
        })),
        ['name'],
      );
    }
  });
  return found.length;
}
