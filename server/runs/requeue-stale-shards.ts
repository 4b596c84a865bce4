import type { DataSource } from 'typeorm';
import type { ShardQueue } from './shard-queue';
import { SHARD_LIVENESS } from './shard-liveness';
import { advisoryLockHeldSql } from '../sql/advisory-lock-held-sql';

/**
 * Puts back on the queue every running shard of a live run whose worker's advisory lock is gone
 * (its worker died; shard-liveness.ts): the UPDATE claims each such shard for exactly one sweeping
 * process, so two sweepers never queue it twice, and the executor's locked re-check stores a
 * shard once whatever happens. Returns the shards queued again.
 */
export async function requeueStaleShards(dataSource: DataSource, queue: ShardQueue): Promise<string[]> {
  const rows: { id: string }[] = await dataSource.query(
    `WITH stale AS (
       UPDATE shards s SET status = 'queued'
         FROM runs r
        WHERE r.id = s.run_id AND r.status IN ('queued', 'running') AND s.status = 'running'
          AND s.claimed_at < clock_timestamp() - make_interval(secs => $2)
          AND NOT ${advisoryLockHeldSql('$1', 's.id::text')}
       RETURNING s.id)
     SELECT id::text FROM stale`,
    [SHARD_LIVENESS.lockClass, SHARD_LIVENESS.claimGraceMs / 1000],
  );
  const ids = rows.map((r) => r.id);
  if (ids.length > 0) await queue.enqueue(ids);
  return ids;
}
