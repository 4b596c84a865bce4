import type { DataSource } from 'typeorm';
import type { resolveTargetSource, Target } from '../../harness';
import { AddedTargetDescriptors } from './added-target-descriptors';
import { openInstalledTarget } from './open-installed-target';
import { readyTargetSourceOf } from './ready-target-source-of';

/**
 * The shard executor's `openTarget` for a worker process: a target installed with Sheetkeeper
 * opens at once (open-installed-target.ts); one an admin added is resolved in this process the
 * first time a shard needs it — an npm version installed into this machine's cache, a program
 * described — and its descriptors kept (added-target-descriptors.ts), so later shards only open a
 * fresh target: once per process and source, not per shard. Null when no installed or ready
 * added target has the name.
 */
export function availableTargetOpener(
  dataSource: DataSource,
  options: Parameters<typeof resolveTargetSource>[1],
  resolve?: typeof resolveTargetSource,
): (name: string) => Promise<Target | null> {
  const added = new AddedTargetDescriptors(options, resolve);
  return async (name) => {
    const installed = openInstalledTarget(name);
    if (installed) return installed;
    const holder = await readyTargetSourceOf(dataSource.manager, name);
    return holder ? added.open(holder.id, holder.source, name) : null;
  };
}
