import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { User } from '../../../server/entities/user';
import { SqlShardQueue } from '../../../server/runs/sql-shard-queue';
import { PlanService } from '../../../server/plans/plan-service';
import { RunService } from '../../../server/runs/run-service';
import { SuiteService } from '../../../server/suites/suite-service';
import { validateSuite } from '../../../shared/validate-suite';
import { demoSuiteBody } from '../../setup/demo-suite-body';
import { createTestDatabase, type TestDatabase } from '../../setup/test-database';
import { until } from '../../setup/until';

const ROOT = path.join(__dirname, '..', '..', '..');
const DEMO = [
  'asin-principal-sz',
  'acos-principal-sz',
  'atan-principal-sz',
  'asinh-principal-sz',
  'acosh-principal-sz',
  'atanh-principal-sz',
];

/** `npm run worker` as its own process against the test database. */
function startWorker(db: TestDatabase): ChildProcess {
  return spawn(process.execPath, ['--import', 'tsx', 'server/worker-main.ts'], {
    cwd: ROOT,
    env: { ...process.env, DATABASE_URL: db.url, SHEETKEEPER_FAKE_SMTP: '0', SHEETKEEPER_WORKERS: '1' },
    stdio: 'ignore',
  });
}

describe('a worker killed mid-shard', () => {
  let db: TestDatabase;
  let queue: SqlShardQueue;
  let planId: string;
  const workers: ChildProcess[] = [];

  beforeAll(async () => {
    db = await createTestDatabase();
    const users = db.dataSource.getRepository(User);
    const [ravi, hanne, kwame] = await Promise.all(
      ['ravi', 'hanne', 'kwame'].map((n) => users.findOneByOrFail({ email: `${n}@sheetkeeper.test` })),
    );
    const suites = new SuiteService(db.dataSource);
    for (const id of DEMO) {
      // A 50 × 50 grid on top of the demo paths makes each shard last seconds, long enough to be killed in.
      const body = demoSuiteBody(`crash-${id}`, id);
      body.paths.push({
        kind: 'grid',
        name: 'box',
        min: { re: '-3', im: '-3' },
        max: { re: '3', im: '3' },
        columns: 50,
        rows: 50,
      });
      const checked = validateSuite(body, id);
      if (!checked.ok) throw new Error(`invalid ${id}`);
      await suites.save(ravi!, checked.suite, 'create');
      await suites.submit(ravi!, checked.suite.id);
      await suites.review(hanne!, checked.suite.id, 1, 'approve', '');
    }
    const plan = await new PlanService(db.dataSource).save(
      kwame!,
      {
        name: 'crash plan',
        description: '',
        recipients: [],
        suites: DEMO.map((id) => `crash-${id}`),
        targets: ['complex.js@2.4.3'],
      },
      null,
    );
    // No expiry at all now: only the shard's lost advisory lock can bring it back (requeue-stale-shards.ts).
    queue = new SqlShardQueue(db.url);
    planId = plan.id;
  }, 60_000);

  afterAll(async () => {
    for (const w of workers) w.kill('SIGKILL');
    await queue.stop();
    await db.drop();
  });

  it("leaves no partial results, and the run completes within 30 s of the restart with a clean run's counts and every outcome stored once", async () => {
    const kwame = await db.dataSource.getRepository(User).findOneByOrFail({ email: 'kwame@sheetkeeper.test' });
    const runs = new RunService(db.dataSource, queue);
    const { run } = await runs.start(planId, 'manual', kwame);
    workers.push(startWorker(db), startWorker(db));

    // Both workers busy: then the first one is certainly in the middle of a shard.
    await until(
      'both workers to run a shard',
      async () =>
        (
          await db.dataSource.query(`SELECT count(*)::int AS n FROM shards WHERE run_id = $1 AND status = 'running'`, [
            run.id,
          ])
        )[0].n >= 2,
      60_000,
    );
    workers[0]!.kill('SIGKILL');
    const restartedAt = Date.now();
    workers.push(startWorker(db));

    const completed = (id: string, timeoutMs: number) =>
      until(
        `run ${id} to complete`,
        async () => {
          const v = await runs.get(id);
          return v.status === 'completed' ? v : null;
        },
        timeoutMs,
      );
    // Issue 11: within 30 s of the restart (the job's expiry alone kept it "running" for 10 min).
    const done = await completed(run.id, 30_000);
    const afterRestartMs = Date.now() - restartedAt;
    expect(done.shardsDone).toBe(DEMO.length);

    // A clean run of the same plan on the surviving workers counts the same.
    const clean = await completed((await runs.start(planId, 'manual', kwame)).run.id, 120_000);
    expect({ counts: done.counts, shardsDone: done.shardsDone }).toEqual({
      counts: clean.counts,
      shardsDone: clean.shardsDone,
    });
    expect(afterRestartMs).toBeLessThan(30_000);

    const [dupes] = await db.dataSource.query(
      `SELECT count(*)::int AS n FROM (SELECT shard_id, path_name, point_index FROM failures WHERE run_id = $1 GROUP BY 1, 2, 3 HAVING count(*) > 1) d`,
      [run.id],
    );
    expect(dupes.n).toBe(0);
    const [twice] = await db.dataSource.query(
      `SELECT (SELECT count(*) FROM (SELECT 1 FROM path_summaries WHERE run_id = $1 GROUP BY shard_id, path_name HAVING count(*) > 1) p)::int
            + (SELECT count(*) FROM (SELECT 1 FROM property_results WHERE run_id = $1 GROUP BY shard_id, law, kind HAVING count(*) > 1) q)::int AS n`,
      [run.id],
    );
    expect(twice.n).toBe(0);
    const [summaries] = await db.dataSource.query(`SELECT count(*)::int AS n FROM path_summaries WHERE run_id = $1`, [
      run.id,
    ]);
    const paths = DEMO.reduce((sum, id) => sum + demoSuiteBody('x', id).paths.length + 1, 0);
    expect(summaries.n).toBe(paths);
    const [stored] = await db.dataSource.query(`SELECT count(*)::int AS n FROM failures WHERE run_id = $1`, [run.id]);
    expect(stored.n).toBe(done.counts.fail + done.counts.error + done.counts.skipped);
    const [retried] = await db.dataSource.query(`SELECT max(attempts)::int AS n FROM shards WHERE run_id = $1`, [
      run.id,
    ]);
    expect(retried.n).toBeGreaterThanOrEqual(2);
  }, 240_000);
});
