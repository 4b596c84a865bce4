import type { EntityManager } from 'typeorm';
import type { TargetIdentity } from '../../shared/target-identity';
import type { TargetSource } from '../../shared/target-source';

export interface ReadyTargetSource {
  id: string;
  source: TargetSource;
  targets: TargetIdentity[];
}

/**
 * The admin-added target sources that resolved (docs/libraries-screen.md), oldest first, with the
 * targets each names. The read of them all for the target sync, the targets list and the worker's
 * available targets (ready-target-source-of.ts reads the one that names a target). Loads no library and starts no program.
 */
export async function readyTargetSources(manager: EntityManager): Promise<ReadyTargetSource[]> {
  return manager.query(
    `SELECT id, source, targets FROM target_sources WHERE state = 'ready' ORDER BY added_at, id`,
  ) as Promise<ReadyTargetSource[]>;
}
