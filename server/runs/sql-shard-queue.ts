import pg from 'pg';
import type { ShardQueue } from './shard-queue';
import { DATABASE_CONNECT_TIMEOUT_MS } from '../database/database-connect-timeout-ms';
import { describeError } from '../database/describe-error';
import { logPoolError } from '../database/log-pool-error';

/** The LISTEN/NOTIFY channel on which an enqueue wakes the idle workers of every process. */
const WAKE_CHANNEL = 'sheetkeeper_shards_queued';
/** After the wake-up connection drops, listen again this much later (polling covers the gap). */
const RELISTEN_MS = 1000;
/** How long `stop` waits for shards in hand before it lets go (the process's own grace is 10 s too). */
const STOP_WAIT_MS = 10_000;

/**
 * Takes the oldest run's next queued shard of the given targets (all when null) for this worker:
 * `FOR UPDATE SKIP LOCKED`, so two workers never take the same one and neither waits on the other.
 * It stays `running` under this worker from here on; the executor's advisory lock then says the
 * worker is alive (shard-liveness.ts), and requeue-stale-shards.ts puts it back if it dies.
 */
const CLAIM_SQL = `
  UPDATE shards SET status = 'running', attempts = attempts + 1, claimed_at = clock_timestamp(),
         worker_id = coalesce($1::uuid, worker_id)
   WHERE status = 'queued'
     AND id = (SELECT s.id FROM shards s JOIN runs r ON r.id = s.run_id
                WHERE s.status = 'queued' AND ($2::text[] IS NULL OR s.target_name = ANY($2::text[]))
                ORDER BY r.created_at, s.id
                LIMIT 1 FOR UPDATE OF s SKIP LOCKED)
  RETURNING id::text`;

export interface SqlShardQueueOptions {
  /** How often an idle worker looks for a shard when no wake-up came (a lost notification), in ms. */
  pollingIntervalMs?: number;
  /**
   * The announced worker whose targets these workers take (worker-registration.ts); each shard
   * taken is recorded as its. Without one, every target's shards are taken and none is recorded:
   * for a process that runs everything itself (tests, benches).
   */
  worker?: { readonly id: string; readonly targets: readonly string[] };
}

/**
 * The shard queue is the `shards` table itself: a queued shard is a row with status 'queued', and a
 * worker takes one whose target it has (CLAIM_SQL), so a shard whose target no worker has simply
 * waits, for as long as it takes, until a worker that has it starts. Why not pg-boss queues: one
 * queue per target would make a partition table per target (pg-boss 10's create_queue), one
 * poller per target in every worker (21 targets here: 21 fetches a second per idle worker, not
 * 1), a worker that takes a job from every queue at once unless it holds some hostage while busy,
 * and a queue to create before an admin-added target's first shard; the shard row already says
 * all a queue would, so there is nothing to keep in step with it.
 *
 * Wake-up: each enqueue sends a NOTIFY, and each process with workers LISTENs on one connection
 * and wakes them at once; the poll is only the fallback should a notification be lost. A worker
 * that finishes a shard looks for the next one at once.
 */
export class SqlShardQueue implements ShardQueue {
  private readonly pool: pg.Pool;
  private readonly sleepers = new Set<() => void>();
  private readonly slots: Promise<void>[] = [];
  private listener: pg.Client | null = null;
  private listening: Promise<void> | null = null;
  private stopping = false;
  private stopped = false;

  constructor(
    private readonly connectionString: string,
    private readonly options: SqlShardQueueOptions = {},
  ) {
    this.pool = new pg.Pool({ connectionString, max: 2, connectionTimeoutMillis: DATABASE_CONNECT_TIMEOUT_MS });
    this.pool.on('error', logPoolError);
  }

  /** The shards are queued rows already (run-service.ts, requeue-stale-shards.ts): this wakes the workers. */
  async enqueue(shardIds: string[]): Promise<void> {
    if (shardIds.length === 0) return;
    this.wakeWorkers();
    await this.pool.query(`SELECT pg_notify($1, '')`, [WAKE_CHANNEL]);
  }

  async work(handle: (shardId: string) => Promise<void>): Promise<void> {
    await this.listen();
    this.slots.push(this.loop(handle));
  }

  private async loop(handle: (shardId: string) => Promise<void>): Promise<void> {
    while (!this.stopping) {
      let shardId: string | null = null;
      try {
        shardId = await this.claim();
      } catch (err) {
        console.error('[sheetkeeper] could not look for a shard; trying again:', describeError(err));
      }
      if (shardId === null) {
        await this.sleep();
        continue;
      }
      try {
        await handle(shardId);
      } catch (err) {
        // The shard stays running with no live lock: the stale-shard sweep queues it again.
        console.error('[sheetkeeper] shard failed; it will be queued again:', describeError(err));
      }
    }
  }

  private async claim(): Promise<string | null> {
    const worker = this.options.worker;
    if (worker && worker.targets.length === 0) return null;
    const { rows } = await this.pool.query<{ id: string }>(CLAIM_SQL, [
      worker?.id ?? null,
      worker ? [...worker.targets] : null,
    ]);
    return rows[0]?.id ?? null;
  }

  private sleep(): Promise<void> {
    return new Promise((resolve) => {
      const done = () => {
        clearTimeout(timer);
        this.sleepers.delete(done);
        resolve();
      };
      const timer = setTimeout(done, this.options.pollingIntervalMs ?? 1000);
      this.sleepers.add(done);
    });
  }

  private wakeWorkers(): void {
    for (const wake of [...this.sleepers]) wake();
  }

  /** One LISTEN connection per process with workers; a dropped one is replaced after RELISTEN_MS. */
  private listen(): Promise<void> {
    this.listening ??= (async () => {
      const client = new pg.Client({
        connectionString: this.connectionString,
        connectionTimeoutMillis: DATABASE_CONNECT_TIMEOUT_MS,
      });
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

  /** Stops taking shards, waits up to STOP_WAIT_MS for the ones in hand, and closes its connections. */
  async stop(): Promise<void> {
    if (this.stopped) return;
    this.stopping = true;
    this.wakeWorkers();
    let timer: NodeJS.Timeout | undefined;
    await Promise.race([
      Promise.all(this.slots),
      new Promise((resolve) => (timer = setTimeout(resolve, STOP_WAIT_MS))),
    ]);
    clearTimeout(timer);
    const client = this.listener;
    this.listener = null;
    this.listening = null;
    await client?.end().catch(() => undefined);
    this.stopped = true;
    await this.pool.end();
  }
}
