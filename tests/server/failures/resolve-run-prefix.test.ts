import type request from 'supertest';
import { shortRunId } from '../../../shared/short-run-id';
import { approvedSuite } from '../../setup/approved-suite';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

/** Two runs whose ids share their first 8 digits, and a third apart: ids chosen here, not drawn. */
const TWINS = ['37e7ec6f-1a2b-4c3d-8e9f-0123456789ab', '37e7ec6f-9999-4c3d-8e9f-0123456789ab'];
const LONE = 'a1b2c3d4-0000-4000-8000-000000000001';

describe('the failure table filtered by a short run id', () => {
  let t: TestApp;
  let kwame: request.Agent;

  beforeAll(async () => {
    t = await startTestApp();
    await approvedSuite(t.db.dataSource, 'prefix-sqrt');
    kwame = await signInAs(t.app, 'maintainer');
    const [target] = await t.db.dataSource.query(`SELECT name FROM targets WHERE installed ORDER BY name LIMIT 1`);
    const plan = await kwame
      .post('/api/plans')
      .send({ name: 'prefix plan', recipients: [], suites: ['prefix-sqrt'], targets: [target.name] });
    // Finished runs with the chosen ids, one failure each, so each filter's answer says which run it matched.
    for (const [i, id] of [...TWINS, LONE].entries()) {
      await t.db.dataSource.query(
        `INSERT INTO runs (id, plan_id, plan_name, trigger, status, shards_total, shards_done, counts, by_class)
         VALUES ($1, $2, 'prefix plan', 'manual', 'completed', 1, 1, '{"pass":0,"fail":1,"error":0,"skipped":0,"notApplicable":0}', '{"branch":1,"accuracy":0}')`,
        [id, plan.body.plan.id],
      );
      const [shard] = await t.db.dataSource.query(
        `INSERT INTO shards (run_id, suite_version_id, suite_slug, target_name, target_library, target_version, status)
         SELECT $1, sv.id, 'prefix-sqrt', $2, 'complex.js', '2.4.3', 'done' FROM suite_versions sv JOIN suites s ON s.id = sv.suite_id WHERE s.slug = 'prefix-sqrt' RETURNING id`,
        [id, target.name],
      );
      await t.db.dataSource.query(
        `INSERT INTO failures (run_id, shard_id, suite_slug, suite_version, target_name, target_library, target_version, convention, path_name, point_index, t, z, z_hex, point_key, expected, actual, outcome_kind, diagnosis_kind, diagnosis, labels, finding_class, rule, reproducer, is_regression)
         VALUES ($1, $2, 'prefix-sqrt', 1, $3, 'complex.js', '2.4.3', 'signed-zero', 'p', $4, 0, '{"re":"-4","im":"-0"}', '{"re":"-0x1p+2","im":"-0x0p+0"}', $5, '{"re":"0","im":"-2"}', '{"re":"0","im":"2"}', 'fail', 'zero-sign', '{"kind":"zero-sign","part":"im","of":"input"}', '[{"kind":"zero-sign","part":"im","of":"input"}]', 'branch', 'G.6.4.2', 'x', false)`,
        [id, shard.id, target.name, i, `k${i}`],
      );
    }
  }, 60_000);
  afterAll(() => t.stop());

  const runsOf = async (run: string) => {
    const res = await kwame.get('/api/failures').query({ run });
    return {
      status: res.status,
      runs: res.status === 200 ? res.body.failures.map((f: { runId: string }) => f.runId) : res.body.issues,
    };
  };

  it('takes the short id the app shows, in either case, and any longer start of the id, as the run it names', async () => {
    expect(await runsOf(shortRunId(LONE))).toEqual({ status: 200, runs: [LONE] });
    expect(await runsOf(shortRunId(LONE).toUpperCase())).toEqual({ status: 200, runs: [LONE] });
    expect(await runsOf('37e7ec6f-9')).toEqual({ status: 200, runs: [TWINS[1]] });
    expect(await runsOf(TWINS[0]!)).toEqual({ status: 200, runs: [TWINS[0]] });
  });

  it('answers a start shared by two runs with a 400 on query.run that asks for more of the id', async () => {
    expect(await runsOf('37e7ec6f')).toEqual({
      status: 400,
      runs: [
        {
          field: 'query.run',
          rule: `is the start of more than one run's id ("37e7ec6f"); type more of the id to tell them apart`,
        },
      ],
    });
  });

  it('answers a start or a whole id of no run with a 400 on query.run, for the table and its export', async () => {
    const none = [{ field: 'query.run', rule: 'names no run ("ffffffff")' }];
    expect(await runsOf('ffffffff')).toEqual({ status: 400, runs: none });
    const csv = await kwame.get('/api/failures/export.csv').query({ run: 'ffffffff' });
    expect([csv.status, csv.body.issues]).toEqual([400, none]);
    expect((await runsOf('ffffffff-ffff-4fff-8fff-ffffffffffff')).status).toBe(400);
  });

  it('refuses fewer than 8 digits before looking for a run', async () => {
    expect(await runsOf('37e7ec6')).toEqual({
      status: 400,
      runs: [{ field: 'query.run', rule: 'must be a run id or its first 8 or more characters, as in "Run 37e7ec6f"' }],
    });
  });
});
