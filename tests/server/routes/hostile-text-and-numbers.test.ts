import type request from 'supertest';
import { STORABLE_TEXT_RULE } from '../../../shared/schemas/text-schema';
import { approvedSuite } from '../../setup/approved-suite';
import { demoSuiteBody } from '../../setup/demo-suite-body';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

/**
 * The server errors of issue 11 (defect 9), each sent as the reviewer found it: PostgreSQL refuses
 * U+0000 in text and jsonb and `\ud800` in jsonb, and a number beyond bigint, so these reached the
 * database and answered 500. Each must be a 400 naming the field, and write nothing.
 */
let t: TestApp;
let admin: request.Agent;
let reviewer: request.Agent;
let contributor: request.Agent;
let failureId: string;
let targetName: string;
const NUL = 'a\u0000b';
const LONE = 'a\ud800b';

beforeAll(async () => {
  t = await startTestApp();
  [admin, reviewer, contributor] = [
    await signInAs(t.app, 'admin'),
    await signInAs(t.app, 'reviewer'),
    await signInAs(t.app, 'contributor'),
  ];
  targetName = (await t.db.dataSource.query(`SELECT name FROM targets WHERE installed LIMIT 1`))[0].name;
  await approvedSuite(t.db.dataSource, 'hostile-plan-suite');
  const plan = await admin
    .post('/api/plans')
    .send({ name: 'hostile plan', recipients: [], suites: ['hostile-plan-suite'], targets: [targetName] });
  const run = await admin.post('/api/runs').send({ planId: plan.body.plan.id });
  const [shard] = await t.db.dataSource.query(`SELECT id FROM shards WHERE run_id = $1 LIMIT 1`, [run.body.run.id]);
  const [row] = await t.db.dataSource.query(
    `INSERT INTO failures (run_id, shard_id, suite_slug, suite_version, target_name, target_library, target_version, convention, path_name, point_index, t, z, z_hex, point_key, outcome_kind, diagnosis_kind, rule, reproducer)
     VALUES ($1, $2, 'hostile-plan-suite', 1, $3, 'complex.js', '2.4.3', 'signed-zero', 'p', 0, 0, '{"re":"1","im":"0"}', '{"re":"0x1p+0","im":"0x0p+0"}', 'k', 'fail', 'inaccurate', 'r', 'x') RETURNING id::text`,
    [run.body.run.id, shard.id, targetName],
  );
  failureId = row.id;
  const draft = await contributor.post('/api/suites').send(demoSuiteBody('hostile-submitted'));
  expect(draft.status).toBe(201);
  expect((await contributor.post('/api/suites/hostile-submitted/submit')).status).toBe(200);
});
afterAll(() => t.stop());

/** Rows of every table in the public schema, to show a refused request wrote nothing. */
async function rowCounts(): Promise<Record<string, number>> {
  const tables: { name: string }[] = await t.db.dataSource.query(
    `SELECT tablename AS name FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename`,
  );
  const counts: Record<string, number> = {};
  for (const { name } of tables)
    counts[name] = Number((await t.db.dataSource.query(`SELECT count(*) AS n FROM "${name}"`))[0].n);
  return counts;
}

const suiteWith = (change: (s: ReturnType<typeof demoSuiteBody>) => void) => {
  const body = demoSuiteBody('hostile-new');
  change(body);
  return body;
};

const CASES: [name: string, send: () => request.Test, field: string][] = [
  [
    'a NUL in a suite title',
    () => contributor.post('/api/suites').send(suiteWith((s) => (s.title = NUL))),
    'body.title',
  ],
  ['a NUL in a story', () => contributor.post('/api/suites').send(suiteWith((s) => (s.story = NUL))), 'body.story'],
  [
    'a lone surrogate in a story',
    () => contributor.post('/api/suites').send(suiteWith((s) => (s.story = LONE))),
    'body.story',
  ],
  [
    'a NUL in a path name',
    () => contributor.post('/api/suites').send(suiteWith((s) => (s.paths[0]!.name = NUL))),
    'body.paths.0.name',
  ],
  [
    'a NUL in a plan name',
    () =>
      admin
        .post('/api/plans')
        .send({ name: NUL + 'cd', recipients: [], suites: ['hostile-plan-suite'], targets: [targetName] }),
    'body.name',
  ],
  [
    'a NUL in a plan description',
    () =>
      admin.post('/api/plans').send({
        name: 'plan',
        description: NUL,
        recipients: [],
        suites: ['hostile-plan-suite'],
        targets: [targetName],
      }),
    'body.description',
  ],
  ['a NUL in a token name', () => admin.post('/api/tokens').send({ name: NUL + 'cd' }), 'body.name'],
  [
    'a NUL in a classify reason',
    () => reviewer.post(`/api/failures/${failureId}/classify`).send({ classification: 'bug', reason: NUL + 'cd' }),
    'body.reason',
  ],
  [
    'a NUL in a review comment',
    () =>
      reviewer
        .post('/api/suites/hostile-submitted/versions/1/review')
        .send({ decision: 'request-changes', comment: NUL }),
    'body.comment',
  ],
  [
    'a NUL in a reference table source cell',
    () =>
      contributor
        .post('/api/suites/hostile-plan-suite/reference-table')
        .attach('file', Buffer.from(`z_re,z_im,expected_re,expected_im,source\n4,0,3,0,x\u0000y\n`), 'table.csv'),
    'file',
  ],
  ['a NUL in suite on the failure table', () => reviewer.get('/api/failures').query({ suite: NUL }), 'query.suite'],
  ['a NUL in target on the failure table', () => reviewer.get('/api/failures').query({ target: NUL }), 'query.target'],
  ['a NUL in suite on the export', () => reviewer.get('/api/failures/export.csv').query({ suite: NUL }), 'query.suite'],
  [
    'a NUL in target on the export',
    () => reviewer.get('/api/failures/export.csv').query({ target: NUL }),
    'query.target',
  ],
  ['a NUL in the suite search', () => reviewer.get('/api/suites').query({ q: NUL }), 'query.q'],
  [
    'an after cursor beyond 64 bits',
    () => reviewer.get('/api/failures').query({ after: '99999999999999999999:0' }),
    'query.after',
  ],
  [
    'an after cursor by ulps beyond 64 bits',
    () => reviewer.get('/api/failures').query({ sort: 'ulps', after: '99999999999999999999:1:1' }),
    'query.after',
  ],
  ['a failure number beyond 64 bits', () => reviewer.get('/api/failures/9999999999999999999'), 'params.id'],
  ['a NUL in a target name', () => reviewer.get(`/api/targets/${encodeURIComponent(NUL)}/fingerprint`), 'params.name'],
  [
    'a NUL in a cron expression',
    () => admin.post('/api/schedules/preview').send({ cron: '0 3 * * *\u0000', timeZone: 'UTC' }),
    'body.cron',
  ],
];

describe('hostile text and numbers', () => {
  it.each(CASES)('answers 400 naming the field and writes nothing for %s', async (_name, send, field) => {
    const before = await rowCounts();
    const res = await send();
    expect({ status: res.status, body: res.body }).toMatchObject({
      status: 400,
      body: { kind: 'invalid-input', issues: expect.arrayContaining([expect.objectContaining({ field })]) },
    });
    expect(await rowCounts()).toEqual(before);
  });

  it('names the rule a NUL breaks', async () => {
    const res = await admin.post('/api/tokens').send({ name: NUL + 'cd' });
    expect(res.body.issues).toEqual([{ field: 'body.name', rule: STORABLE_TEXT_RULE }]);
  });

  it('still accepts a cursor at the top of the bigint range', async () => {
    // A cursor is the last row's number and its place in the class order (failure-query.ts).
    // The table opens newest first (ids descending within a class), so the page after the
    // largest id holds the rows of the later classes and of this class below it: the same rows
    // as after the id just below it, which no row has either.
    const top = await reviewer.get('/api/failures').query({ after: '9223372036854775807:2' });
    const below = await reviewer.get('/api/failures').query({ after: '9223372036854775806:2' });
    expect(top.status).toBe(200);
    expect(top.body.failures.map((f: { id: string }) => f.id)).toEqual(
      below.body.failures.map((f: { id: string }) => f.id),
    );
  });
});
