import { User } from '../../../server/entities/user';
import { PlanService } from '../../../server/plans/plan-service';
import { RunService } from '../../../server/runs/run-service';
import { SqlShardQueue } from '../../../server/runs/sql-shard-queue';
import { approvedSuite } from '../../setup/approved-suite';
import { idleShardQueue } from '../../setup/idle-shard-queue';
import { createTestDatabase, type TestDatabase } from '../../setup/test-database';

describe('SqlShardQueue', () => {
  let db: TestDatabase;
  let runId: string;
  const queues: SqlShardQueue[] = [];
  const queue = (options?: ConstructorParameters<typeof SqlShardQueue>[1]) => {
    const q = new SqlShardQueue(db.url, { pollingIntervalMs: 1000, ...options });
    queues.push(q);
    return q;
  };
  /** A queued shard of `target` in the test's run (its row only: the handlers here run nothing). */
  const queueShard = async (target: string): Promise<string> => {
    const [row] = await db.dataSource.query(
      `INSERT INTO shards (run_id, suite_version_id, suite_slug, target_name, target_library, target_version, status)
       SELECT run_id, suite_version_id, suite_slug, $2, 'lib', '1', 'queued' FROM shards WHERE run_id = $1 LIMIT 1
       RETURNING id::text`,
      [runId, target],
    );
    return row.id;
  };
  const worker = async (label: string, targets: string[]) => {
    const [row] = await db.dataSource.query(`INSERT INTO workers (label, targets) VALUES ($1, $2) RETURNING id::text`, [
      label,
      targets,
    ]);
    return { id: row.id as string, targets };
  };
  const statusOf = async (id: string) =>
    (
      await db.dataSource.query(
        `SELECT s.status, s.attempts, w.label AS worker FROM shards s LEFT JOIN workers w ON w.id = s.worker_id WHERE s.id = $1`,
        [id],
      )
    )[0];

  beforeAll(async () => {
    db = await createTestDatabase();
    await db.dataSource.query(
      `INSERT INTO targets (name, library, version, settings, installed, last_seen_at) VALUES ('queue-seed@1', 'queue-seed', '1', '{}', true, now())`,
    );
    await approvedSuite(db.dataSource, 'queue-sqrt', 'sqrt-principal-sz');
    const kwame = await db.dataSource.getRepository(User).findOneByOrFail({ email: 'kwame@sheetkeeper.test' });
    const plan = await new PlanService(db.dataSource).save(
      kwame,
      { name: 'queue plan', description: '', recipients: [], suites: ['queue-sqrt'], targets: ['queue-seed@1'] },
      null,
    );
    runId = (await new RunService(db.dataSource, idleShardQueue()).start(plan.id, 'manual', kwame)).run.id;
    // The run's own shard is out of the way: every test below queues its own.
    await db.dataSource.query(`UPDATE shards SET status = 'done' WHERE run_id = $1`, [runId]);
  }, 60_000);
  afterEach(async () => {
    await Promise.all(queues.splice(0).map((q) => q.stop()));
    await db.dataSource.query(`UPDATE shards SET status = 'done' WHERE run_id = $1`, [runId]);
  });
  afterAll(() => db.drop());

  it('hands queued shards to a worker one after another without waiting out the polling interval between them', async () => {
    const shards: string[] = [];
    for (let i = 0; i < 12; i += 1) shards.push(await queueShard(`any-${i}@1`));
    const handled: string[] = [];
    let allHandled!: () => void;
    const done = new Promise<void>((resolve) => (allHandled = resolve));
    const started = Date.now();
    await queue().work(async (id) => {
      handled.push(id);
      if (handled.length === shards.length) allHandled();
    });
    await done;
    // With the 1 s interval waited after each shard, 12 take at least 11 s; taken at once, well under
    // a second. 6 s leaves room for a loaded machine and still fails the wait.
    expect(Date.now() - started).toBeLessThan(6000);
    expect([...handled].sort()).toEqual([...shards].sort());
  }, 30_000);

  it("takes only shards of its worker's targets, records that worker on each, and leaves the others queued for a worker that has them", async () => {
    const a = await worker('a:1', ['alpha@1']);
    const b = await worker('b:2', ['beta@1']);
    const alpha = await queueShard('alpha@1');
    const beta = await queueShard('beta@1');
    const byA: string[] = [];
    const byB: string[] = [];
    let gotAlpha!: () => void;
    const alphaTaken = new Promise<void>((resolve) => (gotAlpha = resolve));
    await queue({ worker: a }).work(async (id) => {
      byA.push(id);
      gotAlpha();
    });
    await alphaTaken;
    // Three of A's polls (100 ms each) pass over beta's shard.
    const idle = queue({ worker: a, pollingIntervalMs: 100 });
    await idle.work(async (id) => void byA.push(id));
    await new Promise((r) => setTimeout(r, 350));
    expect({ byA, beta: (await statusOf(beta)).status }).toEqual({ byA: [alpha], beta: 'queued' });

    let gotBeta!: () => void;
    const betaTaken = new Promise<void>((resolve) => (gotBeta = resolve));
    await queue({ worker: b }).work(async (id) => {
      byB.push(id);
      gotBeta();
    });
    await betaTaken;
    expect(byB).toEqual([beta]);
    expect(await statusOf(alpha)).toEqual({ status: 'running', attempts: 1, worker: 'a:1' });
    expect(await statusOf(beta)).toEqual({ status: 'running', attempts: 1, worker: 'b:2' });
  }, 30_000);

  it('keeps the last worker on a shard taken again after its first worker died', async () => {
    const a = await worker('a:3', ['gamma@1']);
    const b = await worker('b:4', ['gamma@1']);
    const gamma = await queueShard('gamma@1');
    const take = async (w: { id: string; targets: string[] }) => {
      let got!: (id: string) => void;
      const taken = new Promise<string>((resolve) => (got = resolve));
      const q = queue({ worker: w });
      await q.work(async (id) => got(id));
      expect(await taken).toBe(gamma);
      await q.stop();
    };
    await take(a);
    // What requeue-stale-shards.ts does to a dead worker's shard.
    await db.dataSource.query(`UPDATE shards SET status = 'queued' WHERE id = $1`, [gamma]);
    await take(b);
    expect(await statusOf(gamma)).toEqual({ status: 'running', attempts: 2, worker: 'b:4' });
  }, 30_000);

  it('starts a shard queued by another process on an idle worker within 100 ms', async () => {
    // The enqueuing side is a second queue object, as the HTTP server is for `npm run worker`:
    // only the database can carry the wake-up between them.
    const sender = queue();
    const idleWorker = queue();
    const waits: number[] = [];
    let arrived: ((id: string) => void) | null = null;
    await idleWorker.work(async (id) => arrived?.(id));
    // The first notification and the pools' first connections are not part of a shard's wait.
    const warm = new Promise<string>((resolve) => (arrived = resolve));
    await sender.enqueue([await queueShard('warm@1')]);
    await warm;
    // Pauses chosen to land at different points of the worker's 1 s polling sleep.
    for (const pause of [350, 700, 550, 900, 450]) {
      await new Promise((r) => setTimeout(r, pause));
      const id = await queueShard(`idle-${pause}@1`);
      const got = new Promise<string>((resolve) => (arrived = resolve));
      const queuedAt = performance.now();
      await sender.enqueue([id]);
      expect(await got).toBe(id);
      waits.push(Math.round(performance.now() - queuedAt));
    }
    // Measured on loopback, 2 shared cores: pg-boss's polling alone 116–658 ms, pg-boss with the
    // NOTIFY wake-up 15–21 ms; the shards table as the queue with the same wake-up 3–45 ms (load
    // average 11–13, two runs). The middle wait is judged, not the slowest: polling never woke a
    // worker in under 116 ms, while one slow wake-up on a loaded machine says nothing about design.
    const middle = [...waits].sort((a, b) => a - b)[2]!;
    expect({ waits, middleUnder100ms: middle < 100 }).toEqual({ waits, middleUnder100ms: true });
  }, 30_000);
});
