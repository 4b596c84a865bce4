import type { DataSource } from 'typeorm';
import { installedTargets } from '../../harness';
import type { TargetIdentity } from '../../shared/target-identity';
import { targetIdentityOf } from '../../shared/target-identity-of';
import { readyTargetSources } from './ready-target-sources';
import { sourceRunsHere } from './source-runs-here';
import { targetSourceOptions } from './target-source-options';

/**
 * The targets this process can run shards for: the libraries installed with Sheetkeeper
 * (installed-targets.ts) and the ones an admin added on the Libraries screen that resolved and can
 * run on this machine (source-runs-here.ts: an npm version always, as it is installed into this
 * machine's cache on first use). A worker announces these and takes only their shards; it opens
 * them through available-target-opener.ts. Loads no library, installs and starts nothing: an added
 * target is its identity as stored.
 */
export async function availableTargets(dataSource: DataSource): Promise<TargetIdentity[]> {
  const { baseDir } = targetSourceOptions();
  const added = (await readyTargetSources(dataSource.manager))
    .filter((s) => sourceRunsHere(s.source, baseDir))
    .flatMap((s) => s.targets);
  return [...installedTargets().map(targetIdentityOf), ...added];
}
