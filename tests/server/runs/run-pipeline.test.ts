import { ReceivedMail } from '../../../server/entities/received-mail';
import { User } from '../../../server/entities/user';
import { FakeSmtpServer } from '../../../server/mail/fake-smtp-server';
import { MailOutbox } from '../../../server/mail/mail-outbox';
import { SqlShardQueue } from '../../../server/runs/sql-shard-queue';
import { PlanService } from '../../../server/plans/plan-service';
import { markRegressions } from '../../../server/runs/mark-regressions';
import { RunService } from '../../../server/runs/run-service';
import { ShardExecutor } from '../../../server/runs/shard-executor';
import { approvedSuite } from '../../setup/approved-suite';
import { conjugatingSqrtTarget } from '../../setup/conjugating-sqrt-target';
import { createTestDatabase, type TestDatabase } from '../../setup/test-database';

/**
 * fakelib, whose version 2 breaks √z in the upper half-plane (tests/setup/conjugating-sqrt-target.ts):
 * what it got right in version 1 and wrong in version 2 must come back as regressions, in exactly one mail.
 */
const fakeLibrary = (version: '1' | '2') => conjugatingSqrtTarget('fakelib', version);

describe('a plan run through the queue, with regressions and their mail', () => {
  let db: TestDatabase;
  let smtp: FakeSmtpServer;
  let outbox: MailOutbox;
  let queue: SqlShardQueue;
  let runs: RunService;
  let planId: string;
  let kwame: User;
  /** The fakelib nightly plan (both fakelib suites) on one fakelib release, made anew or saved over `id`. */
  const savePlan = (target: string, id: string | null) =>
    new PlanService(db.dataSource).save(
      kwame,
      {
        name: 'fakelib nightly',
        description: '',
        recipients: ['kwame@sheetkeeper.test'],
        suites: ['run-sqrt', 'run-log'],
        targets: [target],
      },
      id,
    );

  beforeAll(async () => {
    db = await createTestDatabase();
    smtp = new FakeSmtpServer(db.dataSource);
    const port = await smtp.start(0);
    outbox = new MailOutbox(db.dataSource, { host: '127.0.0.1', port });
    await db.dataSource.query(
      `INSERT INTO targets (name, library, version, settings, installed, last_seen_at) VALUES ('fakelib@1', 'fakelib', '1', '{}', true, now()), ('fakelib@2', 'fakelib', '2', '{}', true, now())`,
    );
    await approvedSuite(db.dataSource, 'run-sqrt', 'sqrt-principal-sz');
    await approvedSuite(db.dataSource, 'run-log', 'log-principal-sz');
    kwame = await db.dataSource.getRepository(User).findOneByOrFail({ email: 'kwame@sheetkeeper.test' });
    const plan = await savePlan('fakelib@1', null);
    planId = plan.id;
    queue = new SqlShardQueue(db.url, { pollingIntervalMs: 500 });
    const executor = new ShardExecutor(db.dataSource, {
      openTarget: (name) => (name.startsWith('fakelib@') ? fakeLibrary(name.endsWith('2') ? '2' : '1') : null),
      outbox,
      appUrl: 'http://127.0.0.1:8460',
    });
    await queue.work((id) => executor.execute(id));
    runs = new RunService(db.dataSource, queue);
  }, 60_000);
  afterAll(async () => {
    await queue.stop();
    outbox.close();
    await smtp.stop();
    await db.drop();
  });

  async function finished(runId: string) {
    // Nothing announces the end of a run but its row, so it is read every 50 ms (a 250 ms step lost
    // 125 ms per run on average), at most 1200 times.
    for (let i = 0; i < 1200; i += 1) {
      const view = await runs.get(runId);
      if (view.status === 'completed' || view.status === 'failed' || view.status === 'cancelled') return view;
      await new Promise((resolve) => setTimeout(resolve, 50));
    }
    throw new Error('the run did not finish within 60 s');
  }

  it('runs every suite × target shard and stores the failures it found', async () => {
    const first = await finished((await runs.start(planId, 'manual', kwame)).run.id);
    // The plan's first completed run compared with nothing: no count of regressions, not 0.
    expect(first).toMatchObject({ status: 'completed', shardsTotal: 2, shardsDone: 2, regressions: null });
    expect(first.counts.pass).toBeGreaterThan(0);
    const [stored] = await db.dataSource.query(`SELECT count(*)::int AS n FROM failures WHERE run_id = $1`, [first.id]);
    expect(stored.n).toBe(first.counts.fail + first.counts.error + first.counts.skipped);
    expect(await db.dataSource.getRepository(ReceivedMail).count()).toBe(0);
    // The suites' property checks ran too, each stored with its pinned seed (√z lists 3 laws, log 4).
    const props: { law: string; kind: string; seed: string }[] = await db.dataSource.query(
      `SELECT law, kind, seed::text FROM property_results WHERE run_id = $1`,
      [first.id],
    );
    expect(props).toHaveLength(7);
    expect(props.every((p) => /^\d+$/.test(p.seed) && ['held', 'failed', 'not-checked'].includes(p.kind))).toBe(true);
  }, 90_000);

  it('reports what version 2 broke as regressions with a version change, in exactly one mail', async () => {
    await savePlan('fakelib@2', planId);
    // Hanne is not on the plan, but subscribes to the library.
    await db.dataSource.query(
      `INSERT INTO subscriptions (user_id, target_key) SELECT id, 'fakelib' FROM users WHERE email = 'hanne@sheetkeeper.test'`,
    );
    const second = await finished((await runs.start(planId, 'manual', kwame)).run.id);
    expect(second.status).toBe('completed');
    expect(second.regressions).toBeGreaterThan(0);
    const regressions: { suite_slug: string; z: { im: string } }[] = await db.dataSource.query(
      `SELECT suite_slug, z FROM failures WHERE run_id = $1 AND is_regression`,
      [second.id],
    );
    expect(regressions).toHaveLength(second.regressions!);
    // Only √z changed, and only in the upper half-plane.
    expect(new Set(regressions.map((r) => r.suite_slug))).toEqual(new Set(['run-sqrt']));
    expect(regressions.every((r) => Number(r.z.im) > 0)).toBe(true);

    await outbox.deliverDue();
    await outbox.deliverDue();
    const mails = await db.dataSource.getRepository(ReceivedMail).find();
    expect(mails).toHaveLength(1);
    expect([...mails[0]!.envelopeTo].sort()).toEqual(['hanne@sheetkeeper.test', 'kwame@sheetkeeper.test']);
    const [byClass] = await db.dataSource.query(
      `SELECT count(*) FILTER (WHERE finding_class = 'branch')::int AS branch,
              count(*) FILTER (WHERE finding_class = 'accuracy')::int AS accuracy
         FROM failures WHERE run_id = $1 AND is_regression`,
      [second.id],
    );
    expect(byClass.branch + byClass.accuracy).toBe(second.regressions);
    expect(mails[0]!.subject).toBe(
      `[Sheetkeeper] ${second.regressions} regressions in fakelib nightly: ${byClass.branch} branch, ${byClass.accuracy} accuracy`,
    );
    expect(mails[0]!.textBody).toContain('fakelib: 1 → 2');
    expect(mails[0]!.htmlBody).toContain('open the case');

    // A second run that found the same regressions against the same baseline (issue 11: two runs
    // of one plan both mailed a regression): its failures are the second run's, and it started
    // just before it, so the first run is its baseline too. Completing it queues no second mail.
    const [twin] = await db.dataSource.query(
      `INSERT INTO runs (plan_id, plan_name, trigger, status, shards_total, shards_done, counts, created_at)
       SELECT plan_id, plan_name, trigger, 'running', shards_total, shards_done, counts, created_at - interval '1 millisecond'
         FROM runs WHERE id = $1 RETURNING id::text`,
      [second.id],
    );
    const columns = (
      await db.dataSource.query(
        `SELECT string_agg(quote_ident(column_name), ', ' ORDER BY ordinal_position) AS c FROM information_schema.columns
          WHERE table_name = 'failures' AND column_name NOT IN ('id', 'run_id', 'is_regression')`,
      )
    )[0].c;
    await db.dataSource.query(
      `INSERT INTO failures (run_id, ${columns}) SELECT $2, ${columns} FROM failures WHERE run_id = $1`,
      [second.id, twin.id],
    );
    const found = await db.dataSource.transaction((tx) =>
      markRegressions(tx, twin.id, { outbox, appUrl: 'http://127.0.0.1' }),
    );
    expect(found).toBe(second.regressions);
    const [queued] = await db.dataSource.query(`SELECT count(*)::int AS n FROM outbox_mail WHERE kind = 'regression'`);
    expect(queued.n).toBe(1);
  }, 90_000);

  it('keeps failures covered by an accepted deviation out of the regressions', async () => {
    // Accept √z's failures on fakelib (any version) for now; a fresh run of version 1 then version 2 finds no regression in it.
    const [failure] = await db.dataSource.query(
      `SELECT id::text FROM failures WHERE suite_slug = 'run-sqrt' AND is_regression LIMIT 1`,
    );
    await db.dataSource.query(
      `INSERT INTO deviations (classification, scope, target_key, suite_slug, reason, expires_at, failure_id, created_by) VALUES ('accepted', 'suite', 'fakelib', 'run-sqrt', 'known upstream', now() + interval '30 days', $1, $2)`,
      [failure.id, kwame.id],
    );
    await savePlan('fakelib@1', planId);
    await finished((await runs.start(planId, 'manual', kwame)).run.id);
    await savePlan('fakelib@2', planId);
    const again = await finished((await runs.start(planId, 'manual', kwame)).run.id);
    const left = await db.dataSource.query(
      `SELECT suite_slug, path_name, z, diagnosis_kind FROM failures WHERE run_id = $1 AND is_regression`,
      [again.id],
    );
    expect({ regressions: again.regressions, left }).toEqual({ regressions: 0, left: [] });
  }, 90_000);

  it('cancels a queued run and skips its shards', async () => {
    const paused = new RunService(db.dataSource, {
      enqueue: async () => undefined,
      work: async () => undefined,
      stop: async () => undefined,
    });
    const { run } = await paused.start(planId, 'manual', kwame);
    const cancelled = await paused.cancel(run.id);
    expect(cancelled.status).toBe('cancelled');
    const [{ n }] = await db.dataSource.query(
      `SELECT count(*)::int AS n FROM shards WHERE run_id = $1 AND status = 'cancelled'`,
      [run.id],
    );
    expect(n).toBe(2);
  });
});
