import { discoverTargets } from './discover-targets';
import type { TargetIdentity } from '../../shared/target-identity';

/**
 * The installed targets as JSON-ready data for `npx sheetkeeper targets`: name,
 * library, version, settings and entries (shared/target-entry.ts) of each, loading no library. In harness/cli.ts:
 * `if (command === 'targets') { process.stdout.write(JSON.stringify(listTargets(), null, 2) + '\n'); return 0; }`
 */
export function listTargets(): TargetIdentity[] {
  return discoverTargets().map(({ name, library, version, settings, entries }) => ({
    name,
    library,
    version,
    settings,
    ...(entries ? { entries } : {}),
  }));
}
