import pg from 'pg';
import PgBoss from 'pg-boss';
import type { ShardQueue } from './shard-queue';
import { describeError } from '../database/describe-error';

const QUEUE = 'run-shard';
/** The LISTEN/NOTIFY channel on which an enqueue wakes the idle workers of every process. */
const WAKE_CHANNEL = 'sheetkeeper_shards_queued';
/** After the wake-up connection drops, listen again this much later (polling covers the gap). */
const RELISTEN_MS = 1000;

export interface PgBossShardQueueOptions {
  /** A job not finished within this is given to another worker (the worker is presumed dead). */
  expireInSeconds?: number;
  retryLimit?: number;
  pollingIntervalSeconds?: number;
  /** How often pg-boss gives expired jobs (dead workers' shards) back to the queue; one process does it per interval. */
  maintenanceIntervalSeconds?: number;
}

/**
 * The shard queue on pg-boss 10 (its own schema `pgboss` in the same database, which pg-boss
 * creates and migrates itself). A shard's job is retried when its worker dies or fails; the
 * executor makes a retried shard's writes idempotent. A dead worker's shard is found sooner by
 * its lost advisory lock (requeue-stale-shards.ts) than by the job's expiry, which stays long
 * because a shard may rightly run for its whole 120 s time limit.
 *
 * Wake-up: pg-boss 10 only polls, at 0.5 s at the least, so an idle worker would wait up to its
 * 1 s interval for a new run's first shard. Each enqueue therefore sends a NOTIFY, and each
 * process with workers LISTENs on one connection and wakes them at once. Measured on loopback on
 * the 2-core machine (tests/server/runs/pg-boss-shard-queue.test.ts, enqueue from another queue
 * object to an idle worker): 15–21 ms, against 116–658 ms by polling alone. The 1 s poll stays
 * as the fallback should a notification be lost.
 */
export class PgBossShardQueue implements ShardQueue {
  private readonly boss: PgBoss;
  private started: Promise<void> | null = null;
  private readonly workerIds = new Set<string>();
  private listener: pg.Client | null = null;
  private listening: Promise<void> | null = null;
  private stopping = false;

  constructor(
    private readonly connectionString: string,
    private readonly options: PgBossShardQueueOptions = {},
  ) {
    this.boss = new PgBoss({
      connectionString,
      max: 4,
      maintenanceIntervalSeconds: options.maintenanceIntervalSeconds ?? 30,
    });
    this.boss.on('error', (err) => console.error('[sheetkeeper] queue error', describeError(err)));
  }

  private start(): Promise<void> {
    this.stopping = false;
    this.started ??= (async () => {
      await this.boss.start();
      await this.boss.createQueue(QUEUE, {
        name: QUEUE,
        retryLimit: this.options.retryLimit ?? 3,
        retryDelay: 1,
        expireInSeconds: this.options.expireInSeconds ?? 600,
      });
    })();
    return this.started;
  }

  async enqueue(shardIds: string[]): Promise<void> {
    if (shardIds.length === 0) return;
    await this.start();
    await this.boss.insert(shardIds.map((shardId) => ({ name: QUEUE, data: { shardId } })));
    this.wakeWorkers();
    await this.boss.getDb().executeSql(`SELECT pg_notify($1, '')`, [WAKE_CHANNEL]);
  }

  async work(handle: (shardId: string) => Promise<void>): Promise<void> {
    await this.start();
    let workerId: string | undefined;
    workerId = await this.boss.work<{ shardId: string }>(
      QUEUE,
      { batchSize: 1, pollingIntervalSeconds: this.options.pollingIntervalSeconds ?? 1 },
      async ([job]) => {
        if (!job) return;
        await handle(job.data.shardId);
        // pg-boss waits out the rest of its polling interval after every job, queued work or not:
        // the demo's 50-shard run on one worker took 49 s, and the end-to-end journey that watches
        // it 56 s; with the worker woken to fetch the next shard at once, that journey takes 10 s.
        // An empty fetch still waits the interval, so an idle worker polls no faster.
        if (workerId) this.boss.notifyWorker(workerId);
      },
    );
    this.workerIds.add(workerId);
    await this.listen();
  }

  private wakeWorkers(): void {
    for (const id of this.workerIds) this.boss.notifyWorker(id);
  }

  /** One LISTEN connection per process with workers; a dropped one is replaced after RELISTEN_MS. */
  private listen(): Promise<void> {
    this.listening ??= (async () => {
      const client = new pg.Client({ connectionString: this.connectionString });
      const again = () => {
        if (this.listener !== client) return;
        this.listener = null;
        this.listening = null;
        void client.end().catch(() => undefined);
        if (!this.stopping) setTimeout(() => void this.listen().catch(() => undefined), RELISTEN_MS).unref();
      };
      client.on('error', (err) => {
        console.error('[sheetkeeper] queue wake-up connection lost; polling until it is back:', err.message);
        again();
      });
      client.on('end', again);
      client.on('notification', () => this.wakeWorkers());
      this.listener = client;
      try {
        await client.connect();
        await client.query(`LISTEN ${WAKE_CHANNEL}`);
      } catch (err) {
        console.error('[sheetkeeper] queue wake-up not listening; polling:', err instanceof Error ? err.message : err);
        again();
      }
    })();
    return this.listening;
  }

  async stop(): Promise<void> {
    this.stopping = true;
    const client = this.listener;
    this.listener = null;
    this.listening = null;
    this.workerIds.clear();
    await client?.end().catch(() => undefined);
    if (this.started) await this.boss.stop({ graceful: true, wait: true, timeout: 10_000 });
    this.started = null;
  }
}
