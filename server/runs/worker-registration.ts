import { hostname } from 'node:os';
import pg from 'pg';
import type { DataSource } from 'typeorm';
import { DATABASE_CONNECT_TIMEOUT_MS } from '../database/database-connect-timeout-ms';
import { describeError } from '../database/describe-error';
import { WORKER_LIVENESS } from './worker-liveness';

export interface WorkerRegistrationOptions {
  /** The target names this process takes; asked again every `targetsRefreshMs`, so a target added meanwhile is announced. */
  findTargets: () => Promise<string[]>;
  /** Shown on the run page beside each pair this worker ran; "host:pid" by default. */
  label?: string;
  /** WORKER_LIVENESS.heartbeatMs and .targetsRefreshMs unless a test needs them sooner. */
  heartbeatMs?: number;
  targetsRefreshMs?: number;
}

/**
 * A process with shard workers, announced in the `workers` table: its label, the targets it takes,
 * its start, its beats (worker-liveness.ts) and its stop. The shard queue claims only shards of
 * `targets`, and the run view tells a shard whose target no live worker has from one merely queued.
 */
export class WorkerRegistration {
  private timer: NodeJS.Timeout | null = null;
  private lockClient: pg.Client | null = null;
  private beating = false;
  private targetsFoundAt = performance.now();

  private constructor(
    private readonly dataSource: DataSource,
    private readonly connectionString: string,
    private readonly options: WorkerRegistrationOptions,
    readonly id: string,
    readonly label: string,
    private current: string[],
  ) {}

  /** The target names announced last. */
  get targets(): readonly string[] {
    return this.current;
  }

  static async start(
    dataSource: DataSource,
    connectionString: string,
    options: WorkerRegistrationOptions,
  ): Promise<WorkerRegistration> {
    const label = options.label ?? `${hostname()}:${process.pid}`;
    const targets = await options.findTargets();
    const [row]: { id: string }[] = await dataSource.query(
      `INSERT INTO workers (label, targets) VALUES ($1, $2) RETURNING id::text`,
      [label, targets],
    );
    const registration = new WorkerRegistration(dataSource, connectionString, options, row!.id, label, targets);
    await registration.holdLock();
    registration.timer = setInterval(
      () => void registration.beat(),
      options.heartbeatMs ?? WORKER_LIVENESS.heartbeatMs,
    );
    registration.timer.unref();
    return registration;
  }

  /** Takes the liveness lock on a connection of its own, once more after that connection was lost. */
  private async holdLock(): Promise<void> {
    if (this.lockClient) return;
    const client = new pg.Client({
      connectionString: this.connectionString,
      connectionTimeoutMillis: DATABASE_CONNECT_TIMEOUT_MS,
    });
    const lost = () => {
      if (this.lockClient !== client) return;
      this.lockClient = null;
      void client.end().catch(() => undefined);
    };
    client.on('error', (err) => {
      console.error('[sheetkeeper] worker liveness connection lost; taken again at the next beat:', describeError(err));
      lost();
    });
    client.on('end', lost);
    this.lockClient = client;
    try {
      await client.connect();
      await client.query(`SELECT pg_advisory_lock($1, hashtext($2))`, [WORKER_LIVENESS.lockClass, this.id]);
    } catch (err) {
      console.error('[sheetkeeper] worker liveness lock not taken; trying again at the next beat:', describeError(err));
      lost();
    }
  }

  private async beat(): Promise<void> {
    if (this.beating) return;
    this.beating = true;
    try {
      if (
        performance.now() - this.targetsFoundAt >=
        (this.options.targetsRefreshMs ?? WORKER_LIVENESS.targetsRefreshMs)
      ) {
        this.current = await this.options.findTargets();
        this.targetsFoundAt = performance.now();
      }
      await this.dataSource.query(`UPDATE workers SET heartbeat_at = now(), targets = $2 WHERE id = $1`, [
        this.id,
        this.current,
      ]);
      await this.holdLock();
    } catch (err) {
      console.error('[sheetkeeper] worker heartbeat failed:', describeError(err));
    } finally {
      this.beating = false;
    }
  }

  /** Says so in the table (the run view stops counting it at once) and lets the lock go. */
  async stop(): Promise<void> {
    if (this.timer) clearInterval(this.timer);
    this.timer = null;
    try {
      await this.dataSource.query(`UPDATE workers SET stopped_at = now(), heartbeat_at = now() WHERE id = $1`, [
        this.id,
      ]);
    } catch (err) {
      console.error('[sheetkeeper] worker stop not recorded:', describeError(err));
    }
    const client = this.lockClient;
    this.lockClient = null;
    await client?.end().catch(() => undefined);
  }
}
