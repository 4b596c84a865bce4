import type { DataSource } from 'typeorm';
import type { ServerConfig } from './config';
import { FakeSmtpServer } from './mail/fake-smtp-server';
import { MailOutbox } from './mail/mail-outbox';
import { availableTargetOpener } from './targets/available-target-opener';
import { targetSourceOptions } from './targets/target-source-options';
import { PgBossShardQueue } from './runs/pg-boss-shard-queue';
import { requeueStaleShards } from './runs/requeue-stale-shards';
import { ShardExecutor } from './runs/shard-executor';
import { describeError } from './database/describe-error';
import { SHARD_LIVENESS } from './runs/shard-liveness';

/** How often due mail is sent; a regression mail waits at most this long after its run ends. */
const MAIL_INTERVAL_MS = 5000;

export interface RunningServices {
  queue: PgBossShardQueue;
  outbox: MailOutbox;
  smtpPort: number;
  fakeSmtp: boolean;
  stop(): Promise<void>;
}

/**
 * What runs beside the HTTP server (and in `npm run worker`): the local mail store when asked
 * for, mail delivery, and `workers` shard workers on the pg-boss queue (0 for none).
 */
export async function startServices(
  dataSource: DataSource,
  config: ServerConfig,
  options: { workers: number; deliverMail: boolean },
): Promise<RunningServices> {
  const smtp = config.fakeSmtp && options.deliverMail ? new FakeSmtpServer(dataSource, config.host) : null;
  const smtpPort = smtp ? await smtp.start(config.smtpPort) : config.smtpPort;
  const outbox = new MailOutbox(dataSource, { host: config.host, port: smtpPort });
  const queue = new PgBossShardQueue(config.databaseUrl);
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
    outbox,
    smtpPort,
    fakeSmtp: smtp !== null,
    stop: async () => {
      if (mailTimer) clearInterval(mailTimer);
      if (sweepTimer) clearInterval(sweepTimer);
      await queue.stop();
      outbox.close();
      await smtp?.stop();
    },
  };
}
