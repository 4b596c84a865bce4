import type { DataSource } from 'typeorm';
import type { TargetSource } from '../../shared/target-source';

/** Stores `source` as an admin-added source that resolved to one target named `name` (no program started). */
export async function readyTargetSource(dataSource: DataSource, source: TargetSource, name: string): Promise<string> {
  const identity = { name, library: 'cmath', version: '3.11.2', settings: { protocol: 'stdio' } };
  const [{ id }] = await dataSource.query(
    `INSERT INTO target_sources (source, state, targets, resolved_at) VALUES ($1, 'ready', $2, now()) RETURNING id`,
    [JSON.stringify(source), JSON.stringify([identity])],
  );
  return id;
}
