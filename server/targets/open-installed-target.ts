import { installedTargets, type Target } from '../../harness';

/** Opens an installed target by name (installed-targets.ts: discovered once per process, loading no library until used); null if absent. */
export function openInstalledTarget(name: string): Target | null {
  return (
    installedTargets()
      .find((d) => d.name === name)
      ?.open() ?? null
  );
}
