import type { DataSource } from 'typeorm';
import { TargetRow } from '../entities/target-row';
import { availableTargets } from './available-targets';
import { installedTargetRows } from './installed-target-rows';
import { narrowTargets } from './narrow-targets';

/**
 * The target names a worker process announces (available-targets.ts, narrowed by
 * SHEETKEEPER_WORKER_TARGETS), recorded in the `targets` table as installed as well: a library
 * installed only on a worker's machine is then a target plans can name, and its shards wait for that
 * worker, instead of being skipped as "not installed" because the server's own machine lacks it.
 */
export async function announceWorkerTargets(
  dataSource: DataSource,
  patterns: readonly string[] | null,
): Promise<string[]> {
  const available = await availableTargets(dataSource);
  const names = new Set(
    narrowTargets(
      available.map((t) => t.name),
      patterns,
    ),
  );
  const announced = available.filter((t) => names.has(t.name));
  if (announced.length > 0)
    await dataSource.getRepository(TargetRow).upsert(installedTargetRows(announced, new Date()), ['name']);
  return [...names];
}
