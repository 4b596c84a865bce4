import type { DataSource } from 'typeorm';
import { installedTargets } from '../../harness';
import type { TargetIdentity } from '../../shared/target-identity';
import { TargetRow } from '../entities/target-row';
import { liveWorkerTargetsSql } from '../sql/live-worker-targets-sql';
import { installedTargetRows } from './installed-target-rows';
import { readyTargetSources } from './ready-target-sources';

/**
 * Records the targets installed on this machine (loading no library) and the ones admins added
 * that resolved (target_sources, read as stored: nothing is installed or started here), and marks
 * every other one not installed unless a live worker announces it, so plans keep naming them and say
 * so. Returns the count.
 */
export async function syncTargets(
  dataSource: DataSource,
  found: TargetIdentity[] = installedTargets(),
): Promise<number> {
  const now = new Date();
  return dataSource.transaction(async (tx) => {
    const added = (await readyTargetSources(tx)).flatMap((s) => s.targets);
    const all = [...found, ...added];
    // A target a live worker announces stays installed although this machine lacks it (announce-worker-targets.ts).
    await tx.query(
      `UPDATE targets SET installed = false
        WHERE name <> ALL(${liveWorkerTargetsSql()})`,
    );
    if (all.length > 0) {
      await tx.getRepository(TargetRow).upsert(installedTargetRows(all, now), ['name']);
    }
    return all.length;
  });
}
