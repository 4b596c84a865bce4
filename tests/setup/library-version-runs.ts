import { rmSync } from 'node:fs';
import type { DataSource } from 'typeorm';
import { User } from '../../server/entities/user';
import { MailOutbox } from '../../server/mail/mail-outbox';
import { PlanService } from '../../server/plans/plan-service';
import { RunService } from '../../server/runs/run-service';
import { ShardExecutor } from '../../server/runs/shard-executor';
import type { ShardQueue } from '../../server/runs/shard-queue';
import type { Target } from '../../harness/adapters/target';
import { seededReferenceCacheDir } from './seeded-reference-cache-dir';

/**
 * A plan of approved `suites` on `<library>@1` or `@2`, each version the library `targetOf` gives,
 * owned by Kwame, and `runOn(version)`, which points the plan at that version and runs it to its
 * end in the calling test, one shard after another as the demo seed does
 * (server/seed/seed-demo-runs.ts), returning the run's id. Regression mail is queued, never sent
 * (nothing delivers it). Reference values start from `npm test`'s seeded cache
 * (seeded-reference-cache-dir.ts); call `close()` at the end, which removes the copy.
 */
export async function libraryVersionRuns(
  dataSource: DataSource,
  library: string,
  plan: { name: string; recipients: string[]; suites: string[] },
  targetOf: (version: '1' | '2') => Target,
): Promise<{ planId: string; runOn: (version: '1' | '2') => Promise<string>; close: () => void }> {
  await dataSource.query(
    `INSERT INTO targets (name, library, version, settings, installed, last_seen_at)
     VALUES ($1 || '@1', $1, '1', '{}', true, now()), ($1 || '@2', $1, '2', '{}', true, now())`,
    [library],
  );
  const owner = await dataSource.getRepository(User).findOneByOrFail({ email: 'kwame@sheetkeeper.test' });
  const plans = new PlanService(dataSource);
  const body = (version: '1' | '2') => ({ ...plan, description: '', targets: [`${library}@${version}`] });
  const planId = (await plans.save(owner, body('1'), null)).id;
  const pending: string[] = [];
  const inline: ShardQueue = {
    enqueue: async (ids) => void pending.push(...ids),
    work: async () => undefined,
    stop: async () => undefined,
  };
  const outbox = new MailOutbox(dataSource, { host: '127.0.0.1', port: 9 });
  const referenceCacheDir = seededReferenceCacheDir();
  const executor = new ShardExecutor(dataSource, {
    openTarget: (name) => (name.startsWith(`${library}@`) ? targetOf(name.endsWith('2') ? '2' : '1') : null),
    outbox,
    appUrl: 'http://127.0.0.1:8460',
    referenceCacheDir,
  });
  const runs = new RunService(dataSource, inline);
  return {
    planId,
    runOn: async (version) => {
      await plans.save(owner, body(version), planId);
      const id = (await runs.start(planId, 'manual', owner)).run.id;
      for (const shard of pending.splice(0)) await executor.execute(shard);
      return id;
    },
    close: () => {
      outbox.close();
      rmSync(referenceCacheDir, { recursive: true, force: true });
    },
  };
}
