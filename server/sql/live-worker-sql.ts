import { WORKER_LIVENESS } from '../runs/worker-liveness';

/**
 * The condition that the `workers` row under `alias` is a live worker (worker-liveness.ts says
 * why the lock or a recent beat). The one definition the run view, the worker list and the
 * claim's readers share.
 */
export function liveWorkerSql(alias: string): string {
  return `(${alias}.stopped_at IS NULL AND (${alias}.heartbeat_at > now() - make_interval(secs => ${WORKER_LIVENESS.staleMs / 1000})
    OR EXISTS (SELECT 1 FROM pg_locks l
                WHERE l.locktype = 'advisory' AND l.granted AND l.database = (SELECT oid FROM pg_database WHERE datname = current_database())
                  AND l.classid = ${WORKER_LIVENESS.lockClass}::oid AND l.objid = hashtext(${alias}.id::text)::oid AND l.objsubid = 2)))`;
}
