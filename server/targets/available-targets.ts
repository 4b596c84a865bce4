import type { DataSource } from 'typeorm';
import { installedTargets, type TargetDescriptor } from '../../harness';
import { readyTargetSources } from './ready-target-sources';
import { sourceRunsHere } from './source-runs-here';
import { targetSourceOptions } from './target-source-options';

/**
 * The targets this process can run shards for: the libraries installed with Sheetkeeper
 * (discover-targets.ts) and the ones an admin added on the Libraries screen that resolved and can
 * run on this machine (source-runs-here.ts: an npm version always, as it is installed into this
 * machine's cache on first use). A worker announces these names and takes only their shards.
 * Loads no library, installs and starts nothing: an added target's descriptor carries its stored
 * identity, and its `open` refuses, since it must be resolved first — a worker opens it through
 * available-target-opener.ts, which does that once per process.
 */
export async function availableTargets(
  dataSource: DataSource,
  baseDir: string = targetSourceOptions().baseDir,
): Promise<TargetDescriptor[]> {
  const added = (await readyTargetSources(dataSource.manager))
    .filter((s) => sourceRunsHere(s.source, baseDir))
    .flatMap((s) =>
      s.targets.map((identity): TargetDescriptor => ({
        ...identity,
        open: () => {
          throw new Error(`${identity.name} was added by an admin: open it through availableTargetOpener`);
        },
      })),
    );
  return [...installedTargets(), ...added];
}
