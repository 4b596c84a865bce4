import { WORKER_LIVENESS } from '../runs/worker-liveness';
import { advisoryLockHeldSql } from './advisory-lock-held-sql';

/**
 * The condition that the `workers` row under `alias` is a live worker (worker-liveness.ts says
 * why the lock or a recent beat). The one definition the run view, the worker list and the
 * live workers' targets (live-worker-targets-sql.ts) share.
 */
export function liveWorkerSql(alias: string): string {
  return `(${alias}.stopped_at IS NULL AND (${alias}.heartbeat_at > now() - make_interval(secs => ${WORKER_LIVENESS.staleMs / 1000})
    OR ${advisoryLockHeldSql(WORKER_LIVENESS.lockClass, `${alias}.id::text`)}))`;
}
