import type { DataSource } from 'typeorm';
import type { Target } from '../../harness/adapters/target';
import type { User } from '../../server/entities/user';
import { MailOutbox } from '../../server/mail/mail-outbox';
import { RunService } from '../../server/runs/run-service';
import { ShardExecutor } from '../../server/runs/shard-executor';
import type { ShardQueue } from '../../server/runs/shard-queue';

/**
 * Runs a plan to its end in the calling test, one shard after another, as the demo seed does
 * (server/seed/seed-demo-runs.ts): `run(planId)` starts a run, executes its shards with the
 * targets `openTarget` gives, and returns the run's id. Mail is queued, never sent (port 9 is
 * never contacted: nothing delivers); call `close()` at the end.
 */
export function inlinePlanRunner(
  dataSource: DataSource,
  owner: User,
  openTarget: (name: string) => Target | null,
): { run: (planId: string) => Promise<string>; close: () => void } {
  const pending: string[] = [];
  const inline: ShardQueue = {
    enqueue: async (ids) => void pending.push(...ids),
    work: async () => undefined,
    stop: async () => undefined,
  };
  const outbox = new MailOutbox(dataSource, { host: '127.0.0.1', port: 9 });
  const executor = new ShardExecutor(dataSource, { openTarget, outbox, appUrl: 'http://127.0.0.1:8460' });
  const runs = new RunService(dataSource, inline);
  return {
    run: async (planId) => {
      const id = (await runs.start(planId, 'manual', owner)).run.id;
      for (const shard of pending.splice(0)) await executor.execute(shard);
      return id;
    },
    close: () => outbox.close(),
  };
}
