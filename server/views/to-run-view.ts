import type { RunView } from '../../shared/run-view';
import type { Run } from '../entities/run';

/** `plan` and `requestedBy` must be loaded; `waitingFor` comes from waiting-targets.ts. */
export function toRunView(run: Run, waitingFor: string[]): RunView {
  return {
    id: run.id,
    planId: run.plan?.id ?? null,
    planName: run.planName,
    trigger: run.trigger,
    status: run.status,
    shardsTotal: run.shardsTotal,
    shardsDone: run.shardsDone,
    counts: run.counts,
    byClass: run.byClass,
    checksStopped: run.checksStopped,
    checksFailed: run.checksFailed,
    regressions: run.regressions,
    waitingFor,
    requestedBy: run.requestedBy?.displayName ?? null,
    createdAt: run.createdAt.toISOString(),
    startedAt: run.startedAt?.toISOString() ?? null,
    finishedAt: run.finishedAt?.toISOString() ?? null,
  };
}
