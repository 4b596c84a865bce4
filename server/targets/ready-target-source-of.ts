import type { EntityManager } from 'typeorm';
import type { ReadyTargetSource } from './ready-target-sources';

/**
 * The resolved admin-added source that names the target `name`, or null: the fingerprint, cut map
 * and shard opener ask for one target, so only its row is read (jsonb containment on `targets`).
 * Names are unique across ready sources (the resolver refuses a clash), so there is at most one.
 */
export async function readyTargetSourceOf(manager: EntityManager, name: string): Promise<ReadyTargetSource | null> {
  const rows = (await manager.query(
    `SELECT id, source, targets FROM target_sources
      WHERE state = 'ready' AND targets @> jsonb_build_array(jsonb_build_object('name', $1::text))
      ORDER BY added_at, id LIMIT 1`,
    [name],
  )) as ReadyTargetSource[];
  return rows[0] ?? null;
}
