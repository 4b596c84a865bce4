import type { DataSource } from 'typeorm';
import { resolveTargetSource, type Target, type TargetDescriptor } from '../../harness';
import { openInstalledTarget } from './open-installed-target';
import { readyTargetSources } from './ready-target-sources';

type ResolveOptions = Parameters<typeof resolveTargetSource>[1];

/**
 * The shard executor's `openTarget` for a worker process: a target installed with Sheetkeeper
 * opens at once (open-installed-target.ts); one an admin added is resolved in this process the
 * first time a shard needs it — an npm version installed into this machine's cache, a program
 * described — and its descriptors kept, so later shards only open a fresh target (once per process
 * and source, not per shard). A resolution that fails is forgotten, so the next shard tries again.
 * Null when no installed or ready added target has the name.
 */
export function availableTargetOpener(
  dataSource: DataSource,
  options: ResolveOptions,
  resolve: typeof resolveTargetSource = resolveTargetSource,
): (name: string) => Promise<Target | null> {
  const resolved = new Map<string, Promise<TargetDescriptor[]>>();
  return async (name) => {
    const installed = openInstalledTarget(name);
    if (installed) return installed;
    const holder = (await readyTargetSources(dataSource.manager)).find((s) => s.targets.some((t) => t.name === name));
    if (!holder) return null;
    // Keyed by id: a source removed and added again is a new row, resolved afresh.
    let descriptors = resolved.get(holder.id);
    if (!descriptors) {
      descriptors = resolve(holder.source, options);
      resolved.set(holder.id, descriptors);
      descriptors.catch(() => resolved.delete(holder.id));
    }
    return (await descriptors).find((d) => d.name === name)?.open() ?? null;
  };
}
