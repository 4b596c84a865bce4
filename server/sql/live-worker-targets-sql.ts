import { liveWorkerSql } from './live-worker-sql';

/**
 * The names of the targets some live worker announces, as one text[] expression. It depends on no
 * outer row, so PostgreSQL computes it once per statement (an InitPlan), however many shards or
 * targets the statement compares with it: a correlated NOT EXISTS ran the liveness check, lock
 * lookup included, once per row.
 */
export function liveWorkerTargetsSql(): string {
  return `ARRAY(SELECT DISTINCT unnest(lw.targets) FROM workers lw WHERE ${liveWorkerSql('lw')})`;
}
