import { discoverTargets, type Target, type TargetDescriptor } from '../../harness';

let installed: Map<string, TargetDescriptor> | null = null;

/** Opens an installed target by name (discovered once per process, loading no library until used); null if absent. */
export function openInstalledTarget(name: string): Target | null {
  installed ??= new Map(discoverTargets().map((d) => [d.name, d]));
  return installed.get(name)?.open() ?? null;
}
