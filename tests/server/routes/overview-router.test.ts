import { writeRegressionGroups } from '../../../server/runs/write-regression-groups';
import request from 'supertest';
import { User } from '../../../server/entities/user';
import { SuiteService } from '../../../server/suites/suite-service';
import type { OverviewView } from '../../../shared/overview-view';
import { validateSuite } from '../../../shared/validate-suite';
import { approvedSuite } from '../../setup/approved-suite';
import { demoSuiteBody } from '../../setup/demo-suite-body';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

describe('GET /api/overview', () => {
  let t: TestApp;
  let kwame: request.Agent;
  let complexJs: string;
  let mathjs: string;
  let planId: string;
  const runs: Record<'old' | 'previous' | 'latest' | 'live', string> = { old: '', previous: '', latest: '', live: '' };

  const overview = async (agent: request.Agent): Promise<OverviewView> => {
    const res = await agent.get('/api/overview');
    expect(res.status).toBe(200);
    return res.body.overview;
  };

  /** Finishes a queued run as a worker would have, `minutes` ago, with these counts and regressions. */
  const finish = async (
    runId: string,
    minutes: number,
    counts: { pass: number; fail: number },
    regressions: number | null,
    status = 'completed',
  ) => {
    await t.db.dataSource.query(
      `UPDATE runs SET status = $2, counts = $3, regressions = $4, shards_done = shards_total,
              created_at = now() - make_interval(mins => $5), started_at = now() - make_interval(mins => $5), finished_at = now() - make_interval(mins => $5 - 1)
        WHERE id = $1`,
      [runId, status, JSON.stringify({ ...counts, error: 0, skipped: 0, notApplicable: 0 }), regressions, minutes],
    );
  };

  /** A failing point of `runId` on `target`, marked a regression or not. */
  let point = 0;
  const failure = async (runId: string, target: string, regression: boolean, path = 'p') => {
    point += 1;
    const [shard] = await t.db.dataSource.query(`SELECT id FROM shards WHERE run_id = $1 LIMIT 1`, [runId]);
    const library = target.split('@')[0];
    await t.db.dataSource.query(
      `INSERT INTO failures (run_id, shard_id, suite_slug, suite_version, target_name, target_library, target_version, convention, path_name, point_index, t, z, z_hex, point_key, outcome_kind, diagnosis_kind, rule, reproducer, is_regression)
       VALUES ($1, $2, 'overview-sqrt', 1, $3, $4, '1', 'signed-zero', $5, $6, 0, '{"re":"-4","im":"-0"}', '{"re":"-0x1p+2","im":"-0x0p+0"}', $7, 'fail', 'cut-side', 'r', 'x', $8)`,
      [runId, shard.id, target, library, path, point, `k${point}`, regression],
    );
  };

  beforeAll(async () => {
    t = await startTestApp();
    await approvedSuite(t.db.dataSource, 'overview-sqrt');
    kwame = await signInAs(t.app, 'maintainer');
    complexJs = (
      await t.db.dataSource.query(
        `SELECT name FROM targets WHERE library = 'complex.js' AND installed ORDER BY name LIMIT 1`,
      )
    )[0].name;
    mathjs = (
      await t.db.dataSource.query(
        `SELECT name FROM targets WHERE library = 'mathjs' AND installed ORDER BY name LIMIT 1`,
      )
    )[0].name;
    const plan = await kwame
      .post('/api/plans')
      .send({ name: 'overview plan', recipients: [], suites: ['overview-sqrt'], targets: [complexJs, mathjs] });
    planId = plan.body.plan.id;
    // A plan has one queued or running run at a time, so each run ends before the next starts.
    const start = async () => (await kwame.post('/api/runs').send({ planId })).body.run.id;
    runs.old = await start();
    await finish(runs.old, 90, { pass: 100, fail: 9 }, 0);
    runs.previous = await start();
    await finish(runs.previous, 60, { pass: 110, fail: 2 }, 0);
    runs.latest = await start();
    await finish(runs.latest, 30, { pass: 105, fail: 7 }, 5);
    runs.live = await start();
    // The older run's regression must not show: only the latest completed run of a plan counts.
    await failure(runs.old, complexJs, true);
    for (let i = 0; i < 3; i += 1) await failure(runs.latest, complexJs, true);
    await failure(runs.latest, complexJs, true, 'accepted-path');
    await failure(runs.latest, complexJs, false);
    await failure(runs.latest, mathjs, true);
    // As markRegressions does when a run completes.
    for (const runId of [runs.old, runs.latest]) await writeRegressionGroups(t.db.dataSource, runId);
  });
  afterAll(() => t.stop());

  it('gives each plan its latest completed run compared with the completed run before it, and its newer queued run', async () => {
    const view = await overview(kwame);
    const mine = view.plans.find((p) => p.planId === planId)!;
    expect(mine.completed).toMatchObject({
      id: runs.latest,
      status: 'completed',
      regressions: 5,
      counts: { pass: 105, fail: 7, error: 0, skipped: 0, notApplicable: 0 },
    });
    expect(mine.comparison?.previous).toEqual({ id: runs.previous, finishedAt: expect.any(String) });
    expect(mine.newer).toMatchObject({ id: runs.live, status: 'queued' });
    expect(view.inProgress.map((r) => r.id)).toContain(runs.live);
    expect(view.inProgress.map((r) => r.id)).not.toContain(runs.latest);
  });

  it('shows a plan that never ran with no latest run, after the plans that ran', async () => {
    const plan = await kwame
      .post('/api/plans')
      .send({ name: 'overview never ran', recipients: [], suites: ['overview-sqrt'], targets: [complexJs] });
    const view = await overview(kwame);
    expect(view.plans.find((p) => p.planId === plan.body.plan.id)).toEqual({
      planId: plan.body.plan.id,
      planName: 'overview never ran',
      completed: null,
      comparison: null,
      newer: null,
    });
    // Plans that ran come first, most recent first; then those that never ran.
    expect(view.plans.findIndex((p) => p.planId === planId)).toBeLessThan(
      view.plans.findIndex((p) => p.planId === plan.body.plan.id),
    );
  });

  it('counts regressions on subscribed libraries in the latest completed run, leaving out accepted deviations and other libraries', async () => {
    const hanne = await signInAs(t.app, 'reviewer');
    await hanne.put('/api/subscriptions').send({ targetKeys: ['complex.js'] });
    const [failureRow] = await t.db.dataSource.query(
      `SELECT id::text FROM failures WHERE run_id = $1 AND path_name = 'accepted-path'`,
      [runs.latest],
    );
    const accepted = await hanne.post(`/api/failures/${failureRow.id}/classify`).send({
      classification: 'accepted',
      scope: 'path',
      reason: 'Documented behaviour on this path.',
      expiresAt: '2099-01-01T00:00:00Z',
    });
    expect(accepted.status).toBe(201);
    const view = await overview(hanne);
    expect(view.needsMe.subscriptions).toEqual(['complex.js']);
    expect(view.needsMe.regressions).toEqual([
      {
        targetKey: 'complex.js',
        runId: runs.latest,
        planName: 'overview plan',
        finishedAt: expect.any(String),
        count: 3,
        branch: 3,
      },
    ]);
    // Kwame subscribes to nothing: no regressions are his to see here.
    expect((await overview(kwame)).needsMe).toMatchObject({ subscriptions: [], regressions: [] });
  });

  it('gives reviewers the suites waiting for review, and their authors the suites sent back', async () => {
    const users = t.db.dataSource.getRepository(User);
    const mei = await users.findOneByOrFail({ email: 'mei@sheetkeeper.test' });
    const hanneUser = await users.findOneByOrFail({ email: 'hanne@sheetkeeper.test' });
    const service = new SuiteService(t.db.dataSource);
    for (const slug of ['overview-waiting', 'overview-sent-back']) {
      const checked = validateSuite(demoSuiteBody(slug), slug);
      if (!checked.ok) throw new Error('demo suite invalid');
      await service.save(mei, checked.suite, 'create');
      await service.submit(mei, slug);
    }
    await service.review(hanneUser, 'overview-sent-back', 1, 'request-changes', 'Add a straddle at 5e-324.');

    const hanne = await signInAs(t.app, 'reviewer');
    const forHanne = await overview(hanne);
    expect(forHanne.needsMe.reviewQueue!.map((s) => s.slug)).toEqual(['overview-waiting']);
    expect(forHanne.needsMe.changesRequested).toEqual([]);

    expect((await overview(kwame)).needsMe.reviewQueue).toBeNull();

    const meiAgent = request.agent(t.app);
    expect(
      (await meiAgent.post('/api/auth/sign-in').send({ email: 'mei@sheetkeeper.test', password: 'mei-demo-2026' }))
        .status,
    ).toBe(200);
    const forMei = await overview(meiAgent);
    expect(forMei.needsMe.reviewQueue).toBeNull();
    expect(forMei.needsMe.changesRequested).toEqual([
      expect.objectContaining({
        slug: 'overview-sent-back',
        version: 1,
        authorName: 'Mei Okonkwo',
        reviewerName: hanneUser.displayName,
        reviewComment: 'Add a straddle at 5e-324.',
      }),
    ]);
    // Ravi, another contributor, wrote neither suite.
    expect((await overview(await signInAs(t.app, 'contributor'))).needsMe.changesRequested).toEqual([]);
  });
});
