import request from 'supertest';
import { User } from '../../../server/entities/user';
import { MailOutbox } from '../../../server/mail/mail-outbox';
import { markRegressions } from '../../../server/runs/mark-regressions';
import { loadOverview } from '../../../server/views/load-overview';
import { approvedSuite } from '../../setup/approved-suite';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

/**
 * One plan's story, as the Overview must tell it: a first run on complex.js alone, a second
 * run with mathjs added (two complex.js points regress; mathjs fails four points it never
 * checked before), and a third run cancelled after one pair. Kwame is on the plan's mail list
 * and subscribes to nothing; Hanne subscribes to complex.js and is not on the list.
 */
describe('loadOverview: plans, comparisons and the regressions waiting on each caller', () => {
  let t: TestApp;
  let outbox: MailOutbox;
  let kwame: User;
  let hanne: User;
  let planId: string;
  let mathjsKey: string;
  const runs = { first: '', second: '', cancelled: '' };

  /** Ends every shard of `runId` with these failing point keys per target library, then completes the run as the executor does. */
  const complete = async (runId: string, failing: Record<string, string[]>) => {
    const ds = t.db.dataSource;
    const shards: { id: string; target_name: string; target_library: string }[] = await ds.query(
      `SELECT id, target_name, target_library FROM shards WHERE run_id = $1`,
      [runId],
    );
    for (const shard of shards) {
      const keys = failing[shard.target_library] ?? [];
      const counts = JSON.stringify({ pass: 10, fail: keys.length, error: 0, skipped: 0, notApplicable: 0 });
      await ds.query(`UPDATE shards SET status = 'done', outcome = 'fail', counts = $2 WHERE id = $1`, [
        shard.id,
        counts,
      ]);
      await ds.query(
        `INSERT INTO path_summaries (run_id, shard_id, path_name, kind, points, counts, by_diagnosis, skipped)
         VALUES ($1, $2, 'p', 'polyline', $3, $4, '{}', '[]')`,
        [runId, shard.id, 10 + keys.length, counts],
      );
      for (const [i, key] of keys.entries())
        await ds.query(
          `INSERT INTO failures (run_id, shard_id, suite_slug, suite_version, target_name, target_library, target_version, convention, path_name, point_index, t, z, z_hex, point_key, outcome_kind, diagnosis_kind, finding_class, rule, reproducer)
           VALUES ($1, $2, 'plans-sqrt', 1, $3, $4, '1', 'signed-zero', 'p', $5, 0, '{"re":"-4","im":"-0"}', '{"re":"-0x1p+2","im":"-0x0p+0"}', $6, 'fail', 'cut-side', 'branch', 'r', 'x')`,
          [runId, shard.id, shard.target_name, shard.target_library, i, key],
        );
    }
    const fail = Object.values(failing).flat().length;
    await ds.query(`UPDATE runs SET shards_done = shards_total, counts = $2, by_class = $3 WHERE id = $1`, [
      runId,
      JSON.stringify({ pass: 10 * shards.length, fail, error: 0, skipped: 0, notApplicable: 0 }),
      JSON.stringify({ branch: fail, accuracy: 0 }),
    ]);
    await ds.transaction((tx) => markRegressions(tx, runId, { outbox, appUrl: 'http://127.0.0.1' }));
  };

  beforeAll(async () => {
    t = await startTestApp();
    const ds = t.db.dataSource;
    outbox = new MailOutbox(ds, { host: '127.0.0.1', port: 9 });
    await approvedSuite(ds, 'plans-sqrt');
    const users = ds.getRepository(User);
    kwame = await users.findOneByOrFail({ email: 'kwame@sheetkeeper.test' });
    hanne = await users.findOneByOrFail({ email: 'hanne@sheetkeeper.test' });
    await ds.query(`INSERT INTO subscriptions (user_id, target_key) VALUES ($1, 'complex.js')`, [hanne.id]);
    const target = async (library: string) =>
      (await ds.query(`SELECT name FROM targets WHERE library = $1 AND installed ORDER BY name LIMIT 1`, [library]))[0]
        .name as string;
    const complexJs = await target('complex.js');
    const mathjs = await target('mathjs');
    mathjsKey = mathjs.replace(/@[^/]+/, '');
    const agent: request.Agent = await signInAs(t.app, 'maintainer');
    const body = {
      name: 'mailed plan',
      // The mail list names Kwame in another case: the match ignores it.
      recipients: ['Kwame@Sheetkeeper.test'],
      suites: ['plans-sqrt'],
      targets: [complexJs],
    };
    planId = (await agent.post('/api/plans').send(body)).body.plan.id;
    const start = async () => (await agent.post('/api/runs').send({ planId })).body.run.id as string;
    runs.first = await start();
    await complete(runs.first, { 'complex.js': ['k1'] });
    expect((await agent.put(`/api/plans/${planId}`).send({ ...body, targets: [complexJs, mathjs] })).status).toBe(200);
    runs.second = await start();
    await complete(runs.second, { 'complex.js': ['k1', 'k2', 'k3'], mathjs: ['m1', 'm2', 'm3', 'm4'] });
    runs.cancelled = await start();
    expect((await agent.post(`/api/runs/${runs.cancelled}/cancel`)).status).toBe(200);
  });
  afterAll(async () => {
    outbox.close();
    await t.stop();
  });

  it("stores no regression count for a plan's first completed run: it compared with nothing", async () => {
    const [first] = await t.db.dataSource.query(`SELECT regressions FROM runs WHERE id = $1`, [runs.first]);
    expect(first.regressions).toBeNull();
  });

  it('counts regressions only over the pairs both runs checked: an added target brings failures, not regressions', async () => {
    const rows: { target_library: string; n: number }[] = await t.db.dataSource.query(
      `SELECT target_library, count(*)::int AS n FROM failures WHERE run_id = $1 AND is_regression GROUP BY 1`,
      [runs.second],
    );
    expect(rows).toEqual([{ target_library: 'complex.js', n: 2 }]);
    const [second] = await t.db.dataSource.query(`SELECT regressions FROM runs WHERE id = $1`, [runs.second]);
    expect(second.regressions).toBe(2);
  });

  it('keeps the latest completed run and its comparison on the plan beside a newer cancelled run', async () => {
    const view = await loadOverview(t.db.dataSource, kwame);
    const plan = view.plans.find((p) => p.planId === planId)!;
    expect(plan.completed).toMatchObject({ id: runs.second, status: 'completed', regressions: 2 });
    expect(plan.newer).toMatchObject({ id: runs.cancelled, status: 'cancelled' });
    expect(plan.comparison).toEqual({
      previous: { id: runs.first, finishedAt: expect.any(String) },
      common: { pairs: 1, fail: 2, error: 0 },
      targetsAdded: { targets: [mathjsKey], fail: 4, error: 0 },
      targetsRemoved: { targets: [], fail: 0, error: 0 },
      suitesAdded: { slugs: [], fail: 0, error: 0 },
      suitesRemoved: { slugs: [], fail: 0, error: 0 },
    });
  });

  it('names the versions of a library checked at a different number of versions, instead of comparing their summed counts', async () => {
    const ds = t.db.dataSource;
    const versions: string[] = (
      await ds.query(`SELECT name FROM targets WHERE library = 'complex.js' AND installed ORDER BY name LIMIT 2`)
    ).map((r: { name: string }) => r.name);
    expect(versions).toHaveLength(2);
    const agent = await signInAs(t.app, 'maintainer');
    const body = { name: 'upgraded plan', recipients: [], suites: ['plans-sqrt'], targets: [versions[0]] };
    const id = (await agent.post('/api/plans').send(body)).body.plan.id;
    const first = (await agent.post('/api/runs').send({ planId: id })).body.run.id;
    await complete(first, { 'complex.js': ['u1'] });
    await agent.put(`/api/plans/${id}`).send({ ...body, targets: versions });
    const second = (await agent.post('/api/runs').send({ planId: id })).body.run.id;
    await complete(second, { 'complex.js': ['u1', 'u2'] });
    const plan = (await loadOverview(ds, kwame)).plans.find((p) => p.planId === id)!;
    expect(plan.comparison).toMatchObject({
      common: { pairs: 0, fail: 0, error: 0 },
      targetsAdded: { targets: versions, fail: 4 },
      targetsRemoved: { targets: [versions[0]], fail: 1 },
    });
  });

  it("gives a maintainer on a plan's mail list that plan's regressions though he subscribes to no library", async () => {
    const view = await loadOverview(t.db.dataSource, kwame);
    expect(view.needsMe.subscriptions).toEqual([]);
    expect(view.needsMe.mailPlans).toContain('mailed plan');
    expect(view.needsMe.regressions.filter((r) => r.runId === runs.second)).toEqual([
      {
        targetKey: null,
        runId: runs.second,
        planName: 'mailed plan',
        finishedAt: expect.any(String),
        count: 2,
        branch: 2,
      },
    ]);
  });

  it('gives a subscriber the same regressions under the library, and counts a mailed plan once when he subscribes too', async () => {
    const forHanne = await loadOverview(t.db.dataSource, hanne);
    expect(forHanne.needsMe.regressions.filter((r) => r.runId === runs.second)).toEqual([
      expect.objectContaining({ targetKey: 'complex.js', count: 2, branch: 2 }),
    ]);
    await t.db.dataSource.query(`INSERT INTO subscriptions (user_id, target_key) VALUES ($1, 'complex.js')`, [
      kwame.id,
    ]);
    try {
      const forKwame = await loadOverview(t.db.dataSource, kwame);
      expect(forKwame.needsMe.regressions.filter((r) => r.runId === runs.second)).toEqual([
        expect.objectContaining({ targetKey: null, count: 2 }),
      ]);
    } finally {
      await t.db.dataSource.query(`DELETE FROM subscriptions WHERE user_id = $1`, [kwame.id]);
    }
  });
});
