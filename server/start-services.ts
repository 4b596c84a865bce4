import type { DataSource } from 'typeorm';
import type { ServerConfig } from './config';
import { FakeSmtpServer } from './mail/fake-smtp-server';
import { MailOutbox } from './mail/mail-outbox';
import { availableTargetOpener } from './targets/available-target-opener';
import { targetSourceOptions } from './targets/target-source-options';
import { SqlShardQueue } from './runs/sql-shard-queue';
import { WorkerRegistration } from './runs/worker-registration';
import { announceWorkerTargets } from './targets/announce-worker-targets';
import { requeueStaleShards } from './runs/requeue-stale-shards';
import { ShardExecutor } from './runs/shard-executor';
import { describeError } from './database/describe-error';
import { SHARD_LIVENESS } from './runs/shard-liveness';

/** How often due mail is sent; a regression mail waits at most this long after its run ends. */
const MAIL_INTERVAL_MS = 5000;

export interface RunningServices {
  queue: SqlShardQueue;
  /** This process as announced to the others; null without shard workers. */
  worker: WorkerRegistration | null;
  outbox: MailOutbox;
  smtpPort: number;
  fakeSmtp: boolean;
  stop(): Promise<void>;
}

/**
 * What runs beside the HTTP server (and in `npm run worker`): the local mail store when asked
 * for, mail delivery, and `workers` shard workers (0 for none), which announce this process and
 * take only the shards of the targets it has, narrowed by `config.workerTargets`.
 */
export async function startServices(
  dataSource: DataSource,
  config: ServerConfig,
  options: { workers: number; deliverMail: boolean },
): Promise<RunningServices> {
  const smtp = config.fakeSmtp && options.deliverMail ? new FakeSmtpServer(dataSource, config.host) : null;
  const smtpPort = smtp ? await smtp.start(config.smtpPort) : config.smtpPort;
  const outbox = new MailOutbox(dataSource, { host: config.host, port: smtpPort });
  const worker =
    options.workers > 0
      ? await WorkerRegistration.start(dataSource, config.databaseUrl, {
          findTargets: () => announceWorkerTargets(dataSource, config.workerTargets),
        })
      : null;
  if (worker) {
    console.log(
      worker.targets.length > 0
        ? `[sheetkeeper] worker ${worker.label} takes shards of ${worker.targets.length} target(s): ${worker.targets.join(', ')}`
        : config.workerTargets
          ? `[sheetkeeper] worker ${worker.label} has none of the targets SHEETKEEPER_WORKER_TARGETS names (${config.workerTargets.join(', ')}): it takes no shards`
          : `[sheetkeeper] worker ${worker.label} finds no target on this machine: it takes no shards`,
    );
  }
  const queue = new SqlShardQueue(config.databaseUrl, worker ? { worker } : {});
  const executor = new ShardExecutor(dataSource, {
    // One opener per process: an added target is resolved once here, on the first shard that needs it.
    openTarget: availableTargetOpener(dataSource, targetSourceOptions(config.targetCacheDir)),
    outbox,
    appUrl: config.appUrl,
    referenceCacheDir: config.referenceCacheDir,
  });
  for (let i = 0; i < options.workers; i += 1) await queue.work((id) => executor.execute(id));
  // Every process with workers looks for dead workers' shards; the sweep's UPDATE lets one process take each.
  let sweeping = false;
  const sweepTimer =
    options.workers > 0
      ? setInterval(() => {
          if (sweeping) return;
          sweeping = true;
          requeueStaleShards(dataSource, queue)
            .then((ids) => {
              if (ids.length > 0) console.log(`[sheetkeeper] queued again ${ids.length} shard(s) of a dead worker`);
            })
            .catch((err: unknown) => console.error('[sheetkeeper] stale shard sweep failed', err))
            .finally(() => {
              sweeping = false;
            });
        }, SHARD_LIVENESS.sweepMs)
      : null;
  let delivering = false;
  const mailTimer = options.deliverMail
    ? setInterval(() => {
        if (delivering) return;
        delivering = true;
        outbox
          .deliverDue()
          .catch((err: unknown) => console.error('[sheetkeeper] mail delivery failed', describeError(err)))
          .finally(() => {
            delivering = false;
          });
      }, MAIL_INTERVAL_MS)
    : null;
  return {
    queue,
    worker,
    outbox,
    smtpPort,
    fakeSmtp: smtp !== null,
    stop: async () => {
      if (mailTimer) clearInterval(mailTimer);
      if (sweepTimer) clearInterval(sweepTimer);
      // Shards in hand first: while they finish, this worker still counts as having their targets.
      await queue.stop();
      await worker?.stop();
      outbox.close();
      await smtp?.stop();
    },
  };
}
