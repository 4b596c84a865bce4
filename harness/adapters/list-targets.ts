import { installedTargets } from './installed-targets';
import type { TargetIdentity } from '../../shared/target-identity';
import type { TargetDescriptor } from './target-descriptor';

/**
 * The known targets (installed by default; a command adds the configured ones, each with `from`,
 * where it was named) as JSON-ready data for `npx sheetkeeper targets`: name,
 * library, version, settings and entries (shared/target-entry.ts) of each, loading no library. In harness/cli.ts:
 * `if (command === 'targets') { process.stdout.write(JSON.stringify(listTargets(), null, 2) + '\n'); return 0; }`
 */
export function listTargets(
  known: readonly TargetDescriptor[] = installedTargets(),
): (TargetIdentity & { from?: string })[] {
  return known.map(({ name, library, version, settings, entries, convention, from }) => ({
    name,
    library,
    version,
    settings,
    ...(entries ? { entries } : {}),
    ...(convention ? { convention } : {}),
    ...(from !== undefined ? { from } : {}),
  }));
}
