import type { DataSource } from 'typeorm';
import { discoverTargets, type TargetDescriptor } from '../../harness';

/**
 * The targets this process can run shards for: the libraries installed with Sheetkeeper
 * (discover-targets.ts) and the ones an admin added on the Libraries screen (stored in PostgreSQL;
 * an npm version is installed into this machine's cache on first use). A worker announces these
 * names and takes only their shards. Loads no library.
 */
export async function availableTargets(dataSource: DataSource): Promise<TargetDescriptor[]> {
  void dataSource; // The stored target sources are read here once they exist (issue 14, part "sources").
  return discoverTargets();
}
