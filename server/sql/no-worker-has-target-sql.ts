import { liveWorkerTargetsSql } from './live-worker-targets-sql';

/**
 * The condition that the shard under `alias` is queued and no live worker announces its target:
 * it waits until one that has it starts (sql-shard-queue.ts), and the run page says so.
 */
export function noWorkerHasTargetSql(alias: string): string {
  return `(${alias}.status = 'queued' AND ${alias}.target_name <> ALL(${liveWorkerTargetsSql()}))`;
}
