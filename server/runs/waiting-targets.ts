import type { DataSource } from 'typeorm';
import type { Run } from '../entities/run';
import { noWorkerHasTargetSql } from '../sql/no-worker-has-target-sql';

/**
 * For each of `runs` still queued or running, the targets of its queued pairs that no live worker
 * has (sorted); finished runs are not asked about, since nothing of theirs waits.
 */
export async function waitingTargets(dataSource: DataSource, runs: Run[]): Promise<Map<string, string[]>> {
  const live = runs.filter((r) => r.status === 'queued' || r.status === 'running').map((r) => r.id);
  if (live.length === 0) return new Map();
  const rows: { runId: string; targets: string[] }[] = await dataSource.query(
    `SELECT s.run_id::text AS "runId", array_agg(DISTINCT s.target_name ORDER BY s.target_name) AS targets
       FROM shards s WHERE s.run_id = ANY($1) AND ${noWorkerHasTargetSql('s')} GROUP BY s.run_id`,
    [live],
  );
  return new Map(rows.map((r) => [r.runId, r.targets]));
}
