import request from 'supertest';
import { User } from '../../../server/entities/user';
import { SuiteService } from '../../../server/suites/suite-service';
import { validateSuite } from '../../../shared/validate-suite';
import { ROLES, type Role } from '../../../shared/roles';
import { approvedSuite } from '../../setup/approved-suite';
import { demoSuiteBody } from '../../setup/demo-suite-body';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

type Who = 'signed-out' | Role;
const WHO: Who[] = ['signed-out', ...ROLES];
type Caller = request.Agent | ReturnType<typeof request>;

let t: TestApp;
let contributorId: string;
let serial = 0;
let targetName: string;
/** One signed-in agent per role, reused: a bcrypt check at cost 11 per case made this table take minutes. */
const agents = new Map<Role, request.Agent>();
async function agentFor(role: Role): Promise<request.Agent> {
  const known = agents.get(role);
  if (known) return known;
  const agent = await signInAs(t.app, role);
  agents.set(role, agent);
  return agent;
}

beforeAll(async () => {
  t = await startTestApp();
  const row = await t.db.dataSource.query(`SELECT id FROM users WHERE email = 'mei@sheetkeeper.test'`);
  contributorId = row[0].id;
  targetName = (
    await t.db.dataSource.query(`SELECT name FROM targets WHERE library = 'complex.js' AND installed LIMIT 1`)
  )[0].name;
  await approvedSuite(t.db.dataSource, 'table-plan-suite');
});

/** A fresh plan over one approved suite and one installed target. */
async function freshPlan(): Promise<string> {
  serial += 1;
  const admin = await agentFor('admin');
  const res = await admin
    .post('/api/plans')
    .send({ name: `table plan ${serial}`, recipients: [], suites: ['table-plan-suite'], targets: [targetName] });
  return res.body.plan.id;
}

/** A fresh queued run of a fresh plan (the test queue runs nothing). */
async function freshRun(): Promise<string> {
  const admin = await agentFor('admin');
  return (await admin.post('/api/runs').send({ planId: await freshPlan() })).body.run.id;
}

/** A stored failure of a fresh run, at the first point of the approved suite's first path (so its path can be drawn). */
async function freshFailure(): Promise<string> {
  const runId = await freshRun();
  const [shard] = await t.db.dataSource.query(`SELECT id, suite_version_id FROM shards WHERE run_id = $1 LIMIT 1`, [
    runId,
  ]);
  const [version] = await t.db.dataSource.query(`SELECT body FROM suite_versions WHERE id = $1`, [
    shard.suite_version_id,
  ]);
  const [row] = await t.db.dataSource.query(
    `INSERT INTO failures (run_id, shard_id, suite_slug, suite_version, target_name, target_library, target_version, convention, path_name, point_index, t, z, z_hex, point_key, outcome_kind, diagnosis_kind, rule, reproducer)
     VALUES ($1, $2, 'table-plan-suite', 1, $3, 'complex.js', '2.4.3', 'signed-zero', $4, 0, 0, '{"re":"1","im":"0"}', '{"re":"0x1p+0","im":"0x0p+0"}', 'k', 'fail', 'inaccurate', 'r', 'x') RETURNING id::text`,
    [runId, shard.id, targetName, version.body.paths[0].name],
  );
  return row.id;
}

/** A fresh schedule of a fresh plan. */
async function freshSchedule(): Promise<string> {
  const admin = await agentFor('admin');
  const res = await admin
    .post('/api/schedules')
    .send({ planId: await freshPlan(), cron: '0 3 * * *', timeZone: 'UTC' });
  return res.body.schedule.id;
}
afterAll(() => t.stop());

/** A fresh account made directly in the table (its password is never used), for actions that change it. */
async function freshUserId(): Promise<string> {
  serial += 1;
  const [row] = await t.db.dataSource.query(
    `INSERT INTO users (email, display_name, password_hash, role) VALUES ($1, 'Table Person', 'x', 'contributor') RETURNING id`,
    [`table-person-${serial}@example.test`],
  );
  return row.id;
}

/** The token of a fresh invitation, read from its mail (the only place it is in the clear). */
async function freshInvitationToken(): Promise<string> {
  serial += 1;
  const email = `table-invited-${serial}@example.test`;
  await (await agentFor('admin')).post('/api/users/invitations').send({ email, role: 'reviewer' });
  const [mail] = await t.db.dataSource.query(`SELECT text_body FROM outbox_mail WHERE $1 = ANY(recipients)`, [email]);
  return /skl_[A-Za-z0-9_-]{43}/.exec(mail.text_body)![0];
}

/** The id of a fresh open invitation, as the Users screen lists it. */
async function freshInvitationId(): Promise<string> {
  serial += 1;
  const email = `table-withdrawn-${serial}@example.test`;
  await (await agentFor('admin')).post('/api/users/invitations').send({ email, role: 'reviewer' });
  const [link] = await t.db.dataSource.query(`SELECT id FROM account_links WHERE email = $1`, [email]);
  return link.id;
}

/** A fresh suite by Mei (a contributor), optionally submitted or approved, so each case acts on its own. */
async function freshSuite(state: 'draft' | 'submitted' | 'approved'): Promise<string> {
  serial += 1;
  const slug = `table-suite-${serial}`;
  const users = t.db.dataSource.getRepository(User);
  const mei = await users.findOneByOrFail({ email: 'mei@sheetkeeper.test' });
  const hanne = await users.findOneByOrFail({ email: 'hanne@sheetkeeper.test' });
  const checked = validateSuite(demoSuiteBody(slug), slug);
  if (!checked.ok) throw new Error('demo suite invalid');
  const service = new SuiteService(t.db.dataSource);
  await service.save(mei, checked.suite, 'create');
  if (state !== 'draft') await service.submit(mei, slug);
  if (state === 'approved') await service.review(hanne, slug, 1, 'approve', '');
  return slug;
}

interface RouteCase {
  name: string;
  /** Sign-in and sign-out change the session, so they get an agent of their own. */
  ownSession?: true;
  call: (caller: Caller, who: Who) => Promise<request.Response>;
  expect: Record<Who, number>;
}

const all = (status: number) => ({
  'signed-out': status,
  admin: status,
  maintainer: status,
  reviewer: status,
  contributor: status,
});
const signedIn = (status: number) => ({ ...all(status), 'signed-out': 401 });

/** Every API route, with the status each kind of caller must get. */
const ROUTES: RouteCase[] = [
  {
    name: 'POST /api/auth/sign-in',
    ownSession: true,
    call: (a) => a.post('/api/auth/sign-in').send({ email: 'ravi@sheetkeeper.test', password: 'ravi-demo-2026' }),
    expect: all(200),
  },
  { name: 'GET /api/me', call: (a) => a.get('/api/me'), expect: signedIn(200) },
  {
    name: 'GET /api/users',
    call: (a) => a.get('/api/users'),
    expect: { 'signed-out': 401, admin: 200, maintainer: 403, reviewer: 403, contributor: 403 },
  },
  {
    name: 'PATCH /api/users/:id',
    call: (a) => a.patch(`/api/users/${contributorId}`).send({ role: 'contributor' }),
    expect: { 'signed-out': 401, admin: 200, maintainer: 403, reviewer: 403, contributor: 403 },
  },
  {
    name: 'GET /api/users/invitations',
    call: (a) => a.get('/api/users/invitations'),
    expect: { 'signed-out': 401, admin: 200, maintainer: 403, reviewer: 403, contributor: 403 },
  },
  {
    name: 'POST /api/users/invitations',
    call: (a, who) => a.post('/api/users/invitations').send({ email: `table-${who}@example.test`, role: 'reviewer' }),
    expect: { 'signed-out': 401, admin: 201, maintainer: 403, reviewer: 403, contributor: 403 },
  },
  {
    name: 'POST /api/users/invitations/:id/cancel',
    call: async (a) => a.post(`/api/users/invitations/${await freshInvitationId()}/cancel`),
    expect: { 'signed-out': 401, admin: 200, maintainer: 403, reviewer: 403, contributor: 403 },
  },
  {
    name: 'POST /api/users/:id/deactivate',
    call: async (a) => a.post(`/api/users/${await freshUserId()}/deactivate`),
    expect: { 'signed-out': 401, admin: 200, maintainer: 403, reviewer: 403, contributor: 403 },
  },
  {
    name: 'POST /api/users/:id/reactivate',
    call: async (a) => a.post(`/api/users/${await freshUserId()}/reactivate`),
    expect: { 'signed-out': 401, admin: 200, maintainer: 403, reviewer: 403, contributor: 403 },
  },
  {
    name: 'POST /api/users/:id/password-reset',
    call: async (a) => a.post(`/api/users/${await freshUserId()}/password-reset`),
    expect: { 'signed-out': 401, admin: 201, maintainer: 403, reviewer: 403, contributor: 403 },
  },
  {
    name: 'POST /api/account-links/lookup',
    call: async (a) => a.post('/api/account-links/lookup').send({ token: await freshInvitationToken() }),
    expect: all(200),
  },
  {
    name: 'POST /api/account-links/use',
    ownSession: true,
    call: async (a) =>
      a
        .post('/api/account-links/use')
        .send({ token: await freshInvitationToken(), password: 'table password 1', displayName: 'Table Person' }),
    expect: all(200),
  },
  { name: 'GET /api/suites', call: (a) => a.get('/api/suites'), expect: signedIn(200) },
  {
    name: 'GET /api/suites/:slug',
    call: async (a) => a.get(`/api/suites/${await freshSuite('draft')}`),
    expect: signedIn(200),
  },
  {
    name: 'POST /api/suites',
    call: (a, who) => a.post('/api/suites').send(demoSuiteBody(`table-new-${who}`)),
    expect: signedIn(201),
  },
  {
    name: 'PUT /api/suites/:slug (a new version of an approved suite)',
    call: async (a) => {
      const slug = await freshSuite('approved');
      return a.put(`/api/suites/${slug}`).send(demoSuiteBody(slug));
    },
    expect: signedIn(201),
  },
  {
    name: 'POST /api/suites/upload',
    call: (a, who) =>
      a
        .post('/api/suites/upload')
        .attach('file', Buffer.from(JSON.stringify(demoSuiteBody(`table-upload-${who}`))), 'suite.json'),
    expect: signedIn(201),
  },
  {
    name: 'POST /api/suites/:slug/reference-table',
    call: async (a) =>
      a
        .post(`/api/suites/${await freshSuite('draft')}/reference-table`)
        .attach('file', Buffer.from('z_re,z_im,expected_re,expected_im,source\n4,0,2,0,x\n'), 'table.csv'),
    expect: signedIn(200),
  },
  {
    name: "POST /api/suites/:slug/submit (someone else's draft)",
    call: async (a) => a.post(`/api/suites/${await freshSuite('draft')}/submit`),
    expect: { 'signed-out': 401, admin: 200, maintainer: 403, reviewer: 403, contributor: 403 },
  },
  {
    name: 'POST /api/suites/:slug/versions/:version/review',
    call: async (a) =>
      a.post(`/api/suites/${await freshSuite('submitted')}/versions/1/review`).send({ decision: 'approve' }),
    expect: { 'signed-out': 401, admin: 200, maintainer: 403, reviewer: 200, contributor: 403 },
  },
  {
    name: 'POST /api/suites/:slug/versions/:version/retire',
    call: async (a) => a.post(`/api/suites/${await freshSuite('approved')}/versions/1/retire`),
    expect: { 'signed-out': 401, admin: 200, maintainer: 200, reviewer: 200, contributor: 403 },
  },
  {
    name: 'GET /api/outbox',
    call: (a) => a.get('/api/outbox'),
    expect: { 'signed-out': 401, admin: 200, maintainer: 403, reviewer: 403, contributor: 403 },
  },
  {
    name: 'GET /api/outbox/queue',
    call: (a) => a.get('/api/outbox/queue'),
    expect: { 'signed-out': 401, admin: 200, maintainer: 403, reviewer: 403, contributor: 403 },
  },
  {
    name: 'GET /api/outbox/:id',
    call: async (a) => {
      const [row] = await t.db.dataSource.query(
        `INSERT INTO received_mail (envelope_from, envelope_to, subject, text_body, raw) VALUES ('a@x.test', '{b@x.test}', 's', 't', 'r') RETURNING id`,
      );
      return a.get(`/api/outbox/${row.id}`);
    },
    expect: { 'signed-out': 401, admin: 200, maintainer: 403, reviewer: 403, contributor: 403 },
  },
  { name: 'GET /api/targets', call: (a) => a.get('/api/targets'), expect: signedIn(200) },
  { name: 'GET /api/workers', call: (a) => a.get('/api/workers'), expect: signedIn(200) },
  {
    name: 'GET /api/targets/:name/fingerprint',
    call: (a) => a.get(`/api/targets/${encodeURIComponent(targetName)}/fingerprint?fn=sqrt`),
    expect: signedIn(200),
  },
  {
    name: 'GET /api/targets/:name/cut-map',
    call: (a) => a.get(`/api/targets/${encodeURIComponent(targetName)}/cut-map?fn=sqrt&grid=5x5`),
    expect: signedIn(200),
  },
  {
    name: 'GET /api/targets/:library/version-matrix',
    call: (a) => a.get('/api/targets/complex.js/version-matrix?suite=table-plan-suite'),
    expect: signedIn(200),
  },
  { name: 'GET /api/target-sources', call: (a) => a.get('/api/target-sources'), expect: signedIn(200) },
  {
    name: 'POST /api/target-sources',
    // A program that cannot start: its background resolution fails at once and installs nothing.
    call: (a, who) => a.post('/api/target-sources').send({ kind: 'program', command: [`/nonexistent/table-${who}`] }),
    expect: { 'signed-out': 401, admin: 202, maintainer: 403, reviewer: 403, contributor: 403 },
  },
  {
    name: 'DELETE /api/target-sources/:id',
    call: async (a) => {
      serial += 1;
      const [row] = await t.db.dataSource.query(
        `INSERT INTO target_sources (source, state) VALUES ($1, 'failed') RETURNING id`,
        [JSON.stringify({ kind: 'program', command: [`/nonexistent/removed-${serial}`] })],
      );
      return a.delete(`/api/target-sources/${row.id}`);
    },
    expect: { 'signed-out': 401, admin: 204, maintainer: 403, reviewer: 403, contributor: 403 },
  },
  { name: 'GET /api/plans', call: (a) => a.get('/api/plans'), expect: signedIn(200) },
  { name: 'GET /api/plans/:id', call: async (a) => a.get(`/api/plans/${await freshPlan()}`), expect: signedIn(200) },
  {
    name: 'GET /api/plans/:id/findings-by-kind',
    call: async (a) => a.get(`/api/plans/${await freshPlan()}/findings-by-kind`),
    expect: signedIn(200),
  },
  {
    name: 'POST /api/plans',
    call: (a, who) =>
      a
        .post('/api/plans')
        .send({ name: `table new plan ${who}`, recipients: [], suites: ['table-plan-suite'], targets: [targetName] }),
    expect: { 'signed-out': 401, admin: 201, maintainer: 201, reviewer: 403, contributor: 403 },
  },
  {
    name: 'PUT /api/plans/:id',
    call: async (a, who) =>
      a
        .put(`/api/plans/${await freshPlan()}`)
        .send({ name: `table renamed ${who}`, recipients: [], suites: ['table-plan-suite'], targets: [targetName] }),
    expect: { 'signed-out': 401, admin: 200, maintainer: 200, reviewer: 403, contributor: 403 },
  },
  {
    name: 'DELETE /api/plans/:id',
    call: async (a) => a.delete(`/api/plans/${await freshPlan()}`),
    expect: { 'signed-out': 401, admin: 204, maintainer: 204, reviewer: 403, contributor: 403 },
  },
  { name: 'GET /api/schedules', call: (a) => a.get('/api/schedules'), expect: signedIn(200) },
  {
    name: 'POST /api/schedules/preview',
    call: (a) => a.post('/api/schedules/preview').send({ cron: '0 3 * * *', timeZone: 'UTC' }),
    expect: signedIn(200),
  },
  {
    name: 'POST /api/schedules',
    call: async (a) => a.post('/api/schedules').send({ planId: await freshPlan(), cron: '0 3 * * *', timeZone: 'UTC' }),
    expect: { 'signed-out': 401, admin: 201, maintainer: 201, reviewer: 403, contributor: 403 },
  },
  {
    name: 'PATCH /api/schedules/:id',
    call: async (a) => a.patch(`/api/schedules/${await freshSchedule()}`).send({ enabled: false }),
    expect: { 'signed-out': 401, admin: 200, maintainer: 200, reviewer: 403, contributor: 403 },
  },
  {
    name: 'DELETE /api/schedules/:id',
    call: async (a) => a.delete(`/api/schedules/${await freshSchedule()}`),
    expect: { 'signed-out': 401, admin: 204, maintainer: 204, reviewer: 403, contributor: 403 },
  },
  { name: 'GET /api/runs', call: (a) => a.get('/api/runs'), expect: signedIn(200) },
  {
    name: 'GET /api/runs (filtered, one page)',
    call: (a) => a.get('/api/runs?status=queued&trigger=manual&limit=5'),
    expect: signedIn(200),
  },
  { name: 'GET /api/overview', call: (a) => a.get('/api/overview'), expect: signedIn(200) },
  {
    name: 'POST /api/runs',
    call: async (a) => a.post('/api/runs').send({ planId: await freshPlan() }),
    expect: { 'signed-out': 401, admin: 202, maintainer: 202, reviewer: 403, contributor: 403 },
  },
  { name: 'GET /api/runs/:id', call: async (a) => a.get(`/api/runs/${await freshRun()}`), expect: signedIn(200) },
  {
    name: 'GET /api/runs/:id/matrix',
    call: async (a) => a.get(`/api/runs/${await freshRun()}/matrix`),
    expect: signedIn(200),
  },
  {
    name: 'GET /api/runs/:id/properties',
    call: async (a) => a.get(`/api/runs/${await freshRun()}/properties`),
    expect: signedIn(200),
  },
  {
    name: 'POST /api/runs/:id/cancel',
    call: async (a) => a.post(`/api/runs/${await freshRun()}/cancel`),
    expect: { 'signed-out': 401, admin: 200, maintainer: 200, reviewer: 403, contributor: 403 },
  },
  { name: 'GET /api/failures', call: (a) => a.get('/api/failures'), expect: signedIn(200) },
  {
    name: 'GET /api/failures/export.csv',
    call: async (a) => a.get(`/api/failures/export.csv?run=${await freshRun()}`),
    expect: signedIn(200),
  },
  { name: 'GET /api/failures/:id (none stored)', call: (a) => a.get('/api/failures/1'), expect: signedIn(404) },
  {
    name: 'POST /api/failures/:id/classify',
    call: async (a) => {
      const runId = await freshRun();
      const [shard] = await t.db.dataSource.query(`SELECT id FROM shards WHERE run_id = $1 LIMIT 1`, [runId]);
      const [row] = await t.db.dataSource.query(
        `INSERT INTO failures (run_id, shard_id, suite_slug, suite_version, target_name, target_library, target_version, convention, path_name, point_index, t, z, z_hex, point_key, outcome_kind, diagnosis_kind, rule, reproducer)
         VALUES ($1, $2, 'table-plan-suite', 1, $3, 'complex.js', '2.4.3', 'signed-zero', 'p', 0, 0, '{"re":"1","im":"0"}', '{"re":"0x1p+0","im":"0x0p+0"}', 'k', 'fail', 'inaccurate', 'r', 'x') RETURNING id::text`,
        [runId, shard.id, targetName],
      );
      return a.post(`/api/failures/${row.id}/classify`).send({ classification: 'bug', reason: 'seen upstream' });
    },
    expect: { 'signed-out': 401, admin: 201, maintainer: 403, reviewer: 201, contributor: 403 },
  },
  {
    name: 'POST /api/failures/:id/classify (accepted deviation)',
    call: async (a) =>
      a
        .post(`/api/failures/${await freshFailure()}/classify`)
        .send({ classification: 'accepted', reason: 'documented upstream', expiresAt: '2099-01-01T00:00:00Z' }),
    expect: { 'signed-out': 401, admin: 201, maintainer: 201, reviewer: 201, contributor: 403 },
  },
  {
    name: 'GET /api/failures/:id/path',
    call: async (a) => a.get(`/api/failures/${await freshFailure()}/path`),
    expect: signedIn(200),
  },
  { name: 'GET /api/deviations', call: (a) => a.get('/api/deviations'), expect: signedIn(200) },
  {
    name: 'POST /api/deviations/:id/revoke',
    call: async (a) => {
      const [row] = await t.db.dataSource.query(
        `INSERT INTO deviations (classification, scope, target_key, suite_slug, reason, expires_at, created_by) VALUES ('accepted', 'suite', 'complex.js', 'x', 'r', now() + interval '1 day', $1) RETURNING id`,
        [contributorId],
      );
      return a.post(`/api/deviations/${row.id}/revoke`);
    },
    expect: { 'signed-out': 401, admin: 200, maintainer: 403, reviewer: 200, contributor: 403 },
  },
  { name: 'GET /api/tokens', call: (a) => a.get('/api/tokens'), expect: signedIn(200) },
  { name: 'POST /api/tokens', call: (a) => a.post('/api/tokens').send({ name: 'table token' }), expect: signedIn(201) },
  {
    name: 'POST /api/tokens/:id/revoke (own token)',
    call: async (a, who) => {
      if (who === 'signed-out') return a.post('/api/tokens/00000000-0000-4000-8000-000000000000/revoke');
      const created = await a.post('/api/tokens').send({ name: 'to revoke' });
      return a.post(`/api/tokens/${created.body.token.id}/revoke`);
    },
    expect: signedIn(200),
  },
  { name: 'GET /api/subscriptions', call: (a) => a.get('/api/subscriptions'), expect: signedIn(200) },
  {
    name: 'PUT /api/subscriptions',
    call: (a) => a.put('/api/subscriptions').send({ targetKeys: ['complex.js'] }),
    expect: signedIn(200),
  },
  { name: 'GET /api/openapi.json', call: (a) => a.get('/api/openapi.json'), expect: all(200) },
  { name: 'GET /api/unknown-route', call: (a) => a.get('/api/unknown-route'), expect: all(404) },
  { name: 'POST /api/auth/sign-out', ownSession: true, call: (a) => a.post('/api/auth/sign-out'), expect: all(204) },
];

describe('route × caller table', () => {
  const cases = ROUTES.flatMap((route) => WHO.map((who) => [route.name, who, route.expect[who], route] as const));

  it.each(cases)('%s answers %s with %i', async (_name, who, status, route) => {
    const caller =
      who === 'signed-out' ? request(t.app) : route.ownSession ? await signInAs(t.app, who) : await agentFor(who);
    const res = await route.call(caller, who);
    expect({ status: res.status, body: res.status >= 400 ? res.body : undefined }).toEqual({
      status,
      body: res.status >= 400 ? expect.anything() : undefined,
    });
    if (status === 401) expect(res.body.kind).toBe('signed-out');
    if (status === 403) expect(res.body.kind).toBe('forbidden');
  });
});
