import { liveWorkerSql } from './live-worker-sql';

/**
 * The condition that the shard under `alias` is queued and no live worker announces its target:
 * it waits until one that has it starts (sql-shard-queue.ts), and the run page says so.
 */
export function noWorkerHasTargetSql(alias: string): string {
  return `(${alias}.status = 'queued' AND NOT EXISTS (SELECT 1 FROM workers lw WHERE ${liveWorkerSql('lw')} AND ${alias}.target_name = ANY(lw.targets)))`;
}
