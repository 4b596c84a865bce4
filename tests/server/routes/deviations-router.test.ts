import type request from 'supertest';
import { failurePageJson } from '../../../server/failures/failure-page-json';
import { EXPIRY_DAY_RULE } from '../../../shared/schemas/expiry-day-schema';
import { approvedSuite } from '../../setup/approved-suite';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

/** The library's versions the failures below ran on, one path each. */
const VERSIONS = ['2.4.1', '2.4.3', '2.10.0'];

describe('decisions: versions, listing, revoking, and where they show', () => {
  let t: TestApp;
  let runId: string;
  let hanne: request.Agent;
  /** Failure numbers by path ("p" or "q") and version. */
  const ids: Record<string, string> = {};

  beforeAll(async () => {
    t = await startTestApp();
    await approvedSuite(t.db.dataSource, 'decide-sqrt');
    const admin = await signInAs(t.app, 'admin');
    hanne = await signInAs(t.app, 'reviewer');
    const target = (
      await t.db.dataSource.query(`SELECT name FROM targets WHERE library = 'complex.js' AND installed LIMIT 1`)
    )[0].name;
    const plan = await admin
      .post('/api/plans')
      .send({ name: 'decide plan', recipients: [], suites: ['decide-sqrt'], targets: [target] });
    runId = (await admin.post('/api/runs').send({ planId: plan.body.plan.id })).body.run.id;
    const [shard] = await t.db.dataSource.query(`SELECT id FROM shards WHERE run_id = $1`, [runId]);
    for (const path of ['p', 'q'])
      for (const version of VERSIONS) {
        const [row] = await t.db.dataSource.query(
          `INSERT INTO failures (run_id, shard_id, suite_slug, suite_version, target_name, target_library, target_version, convention, path_name, point_index, t, z, z_hex, point_key, outcome_kind, diagnosis_kind, diagnosis, labels, finding_class, rule, reproducer)
           VALUES ($1, $2, 'decide-sqrt', 1, $3, 'complex.js', $4, 'signed-zero', $5, 0, 0, '{"re":"-4","im":"-0"}', '{"re":"-0x1p+2","im":"-0x0p+0"}', $6, 'fail', 'zero-sign', '{"kind":"zero-sign","part":"im","of":"input"}', '[{"kind":"zero-sign","part":"im","of":"input"}]', 'branch', 'G.6.4.2', 'x')
           RETURNING id::text`,
          [runId, shard.id, `complex.js@${version}`, version, path, `decide-sqrt|${path}|0`],
        );
        ids[`${path}@${version}`] = row.id;
      }
  });
  afterAll(() => t.stop());

  /** The versions whose failures on `path` the accepted filter lists. */
  const acceptedVersions = async (path: string) =>
    (await hanne.get(`/api/failures?run=${runId}&status=accepted&limit=100`)).body.failures
      .filter((f: { pathName: string }) => f.pathName === path)
      .map((f: { targetName: string }) => f.targetName.split('@')[1])
      .sort();

  const accept = (failure: string, body: Record<string, unknown>) =>
    hanne.post(`/api/failures/${failure}/classify`).send({
      classification: 'accepted',
      scope: 'path',
      reason: 'documented by the library',
      expiresAt: '2099-01-31',
      ...body,
    });

  it('covers only the version it was given on with "this-version", and that version and later ones with "this-and-later"', async () => {
    const only = await accept(ids['p@2.4.3']!, { versions: 'this-version' });
    expect(only.status).toBe(201);
    expect(only.body.deviation).toMatchObject({ versions: 'this-version', targetVersion: '2.4.3', state: 'in-force' });
    expect(await acceptedVersions('p')).toEqual(['2.4.3']);
    await hanne.post(`/api/deviations/${only.body.deviation.id}/revoke`).expect(200);

    const later = await accept(ids['p@2.4.3']!, { versions: 'this-and-later' });
    expect(await acceptedVersions('p')).toEqual(['2.10.0', '2.4.3']);
    await hanne.post(`/api/deviations/${later.body.deviation.id}/revoke`).expect(200);
    expect(await acceptedVersions('p')).toEqual([]);
  });

  it('covers every version, earlier ones included, when a client leaves versions out (the meaning before versions)', async () => {
    const every = await accept(ids['q@2.4.3']!, { expiresAt: '2099-01-31T00:00:00Z' });
    expect(every.body.deviation).toMatchObject({ versions: 'every-version', expiresAt: '2099-01-31T00:00:00.000Z' });
    expect(await acceptedVersions('q')).toEqual(['2.10.0', '2.4.1', '2.4.3']);
    await hanne.post(`/api/deviations/${every.body.deviation.id}/revoke`).expect(200);
  });

  it('answers a badly written or past expiry day in the words of the field', async () => {
    const badDay = await accept(ids['p@2.4.1']!, { expiresAt: '2027-02-30' });
    expect(badDay.status).toBe(400);
    expect(badDay.body.issues).toEqual([{ field: 'body.expiresAt', rule: EXPIRY_DAY_RULE }]);
    const words = await accept(ids['p@2.4.1']!, { expiresAt: 'next spring' });
    expect(words.body.issues).toEqual([{ field: 'body.expiresAt', rule: EXPIRY_DAY_RULE }]);
    const today = await accept(ids['p@2.4.1']!, { expiresAt: new Date().toISOString().slice(0, 10) });
    expect(today.body.issues).toEqual([{ field: 'body.expiresAt', rule: 'must be a day after today (UTC)' }]);
    const versions = await accept(ids['p@2.4.1']!, { versions: 'all of them' });
    expect(versions.body.issues).toEqual([
      { field: 'body.versions', rule: 'must be this-version, this-and-later, every-version' },
    ]);
    expect(
      await t.db.dataSource.query(`SELECT count(*)::int AS n FROM deviations WHERE failure_id = $1`, [ids['p@2.4.1']]),
    ).toEqual([{ n: 0 }]);
  });

  it('lists decisions with their state, expired and revoked ones included, filtered by library and suite', async () => {
    const live = await accept(ids['p@2.10.0']!, { versions: 'this-version' });
    const [user] = await t.db.dataSource.query(`SELECT id FROM users WHERE role = 'reviewer' LIMIT 1`);
    await t.db.dataSource.query(
      `INSERT INTO deviations (classification, scope, versions, target_key, target_version, suite_slug, path_name, reason, expires_at, failure_id, created_by)
       VALUES ('accepted', 'path', 'this-version', 'complex.js', '2.4.1', 'decide-sqrt', 'p', 'lapsed', now() - interval '1 day', $1, $2),
              ('bug', 'suite', 'every-version', 'mathjs/number', NULL, 'other-suite', NULL, 'elsewhere', NULL, NULL, $2)`,
      [ids['p@2.4.1'], user.id],
    );
    const all = (await hanne.get('/api/deviations?library=complex.js&suite=decide-sqrt')).body.deviations;
    expect(all.map((d: { reason: string; state: string }) => `${d.reason}: ${d.state}`)).toEqual([
      'lapsed: expired',
      'documented by the library: in-force',
      'documented by the library: revoked',
      'documented by the library: revoked',
      'documented by the library: revoked',
    ]);
    expect(all[1]).toMatchObject({ id: live.body.deviation.id, createdBy: 'Hanne Lindqvist', targetKey: 'complex.js' });
    expect(
      (await hanne.get('/api/deviations?library=mathjs/number')).body.deviations.map(
        (d: { reason: string }) => d.reason,
      ),
    ).toEqual(['elsewhere']);
    expect((await hanne.get(`/api/deviations?id=${live.body.deviation.id}`)).body.deviations).toHaveLength(1);
    const bad = await hanne.get('/api/deviations?library=%00');
    expect(bad.status).toBe(400);
    expect(bad.body.issues[0].field).toBe('query.library');
    await hanne.post(`/api/deviations/${live.body.deviation.id}/revoke`).expect(200);
  });

  it('shows the decisions that apply on the case, and the one in force as a mark on the table page', async () => {
    const given = await accept(ids['q@2.10.0']!, { versions: 'this-and-later', scope: 'suite' });
    const detail = (await hanne.get(`/api/failures/${ids['q@2.10.0']}`)).body;
    expect(detail).toMatchObject({ targetKey: 'complex.js', targetVersion: '2.10.0' });
    expect(detail.decisions.map((d: { id: string }) => d.id)).toContain(given.body.deviation.id);
    expect(
      (await hanne.get(`/api/failures/${ids['q@2.4.1']}`)).body.decisions.map((d: { id: string }) => d.id),
    ).not.toContain(given.body.deviation.id);

    const page = JSON.parse(await failurePageJson(t.db.dataSource, { run: runId, sort: 'id', limit: 100 }));
    expect(page.decisions[ids['q@2.10.0']!]).toEqual({
      id: given.body.deviation.id,
      classification: 'accepted',
      expiresAt: '2099-01-31T00:00:00.000Z',
    });
    expect(page.decisions[ids['q@2.4.1']!]).toBeUndefined();
    await hanne.post(`/api/deviations/${given.body.deviation.id}/revoke`).expect(200);
    const after = JSON.parse(await failurePageJson(t.db.dataSource, { run: runId, sort: 'id', limit: 100 }));
    expect(after.decisions).toEqual({});
  });
});
