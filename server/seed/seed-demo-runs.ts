import type { DataSource } from 'typeorm';
import { Plan } from '../entities/plan';
import { Run } from '../entities/run';
import { TargetRow } from '../entities/target-row';
import { User } from '../entities/user';
import { MailOutbox } from '../mail/mail-outbox';
import { openInstalledTarget } from '../targets/open-installed-target';
import { PlanService } from '../plans/plan-service';
import { RunService } from '../runs/run-service';
import { ShardExecutor } from '../runs/shard-executor';
import type { ShardQueue } from '../runs/shard-queue';
import { seedDemoDecisions } from './seed-demo-decisions';

/** The release the demo team's nightly plan followed before it moved to the two newest ones (invented story). */
const EARLIER_RELEASE = 'complex.js@2.3.0';
const PLAN = 'complex.js nightly';

/**
 * Two completed runs of the demo nightly plan with real results, so a fresh `npm start` shows
 * a living product: first the plan as it was (complex.js 2.3.0), then as it is (the two newest
 * releases). complex.js 2.4.1 changed zero signs that 2.3.0 had right (exp(3 − 0i), log(1 − 0i),
 * seen with `sheetkeeper matrix`), so the second run has regressions, a version change and a
 * regression mail in the outbox, and two decisions on their failures (seed-demo-decisions.ts).
 * Shards run here one after another, not through the queue.
 * Does nothing when the plan already has a run. Returns the number of runs added.
 */
export async function seedDemoRuns(
  dataSource: DataSource,
  options: { smtp: { host: string; port: number }; appUrl: string; referenceCacheDir?: string | null },
): Promise<number> {
  const plan = await dataSource
    .getRepository(Plan)
    .findOne({ where: { name: PLAN }, relations: { suites: true, targets: true } });
  if (!plan || (await dataSource.getRepository(Run).existsBy({ plan: { id: plan.id } }))) return 0;
  const kwame = await dataSource.getRepository(User).findOneByOrFail({ email: 'kwame@sheetkeeper.test' });
  const plans = new PlanService(dataSource);
  const executor = new ShardExecutor(dataSource, {
    openTarget: openInstalledTarget,
    outbox: new MailOutbox(dataSource, options.smtp),
    appUrl: options.appUrl,
    referenceCacheDir: options.referenceCacheDir,
  });
  const pending: string[] = [];
  const inline: ShardQueue = {
    enqueue: async (ids) => void pending.push(...ids),
    work: async () => undefined,
    stop: async () => undefined,
  };
  const runs = new RunService(dataSource, inline);
  const body = {
    name: plan.name,
    description: plan.description,
    recipients: plan.recipients,
    suites: plan.suites.map((s) => s.slug),
    targets: plan.targets.map((t) => t.name),
  };
  const runOnce = async () => {
    await runs.start(plan.id, 'schedule', kwame);
    for (const id of pending.splice(0)) await executor.execute(id);
  };

  let added = 0;
  if (await dataSource.getRepository(TargetRow).existsBy({ name: EARLIER_RELEASE, installed: true })) {
    await plans.save(kwame, { ...body, targets: [EARLIER_RELEASE] }, plan.id);
    try {
      await runOnce();
      added += 1;
    } finally {
      await plans.save(kwame, body, plan.id);
    }
  }
  await runOnce();
  await seedDemoDecisions(dataSource);
  return added + 1;
}
