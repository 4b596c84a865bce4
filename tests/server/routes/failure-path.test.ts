import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { complexJsTarget } from '../../../harness/adapters/complex-js-target';
import { failurePath } from '../../../server/failures/failure-path';
import { ShardExecutor } from '../../../server/runs/shard-executor';
import type { MailOutbox } from '../../../server/mail/mail-outbox';
import type { FailurePathView } from '../../../shared/failure-path-view';
import { approvedSuite } from '../../setup/approved-suite';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

/**
 * Real runs of complex.js 2.4.3, which ignores the sign of zero: its failures on the
 * straddle path of √z and on the regular branch of √(z²−1) are what the path pictures draw.
 */
describe('the path of a failing case', () => {
  let t: TestApp;
  let kwame: request.Agent;
  const runIds: Record<string, string> = {};

  async function runOf(slug: string, referenceCacheDir: string | null = null): Promise<string> {
    const target = (await t.db.dataSource.query(`SELECT name FROM targets WHERE name = 'complex.js@2.4.3'`))[0].name;
    const plan = await kwame
      .post('/api/plans')
      .send({ name: `path plan ${slug}`, recipients: [], suites: [slug], targets: [target] });
    const run = (await kwame.post('/api/runs').send({ planId: plan.body.plan.id })).body.run.id as string;
    const executor = new ShardExecutor(t.db.dataSource, {
      openTarget: () => complexJsTarget('complex.js', '2.4.3'),
      outbox: { enqueue: async () => undefined } as unknown as MailOutbox,
      appUrl: 'http://127.0.0.1',
      referenceCacheDir,
    });
    for (const { id } of await t.db.dataSource.query(`SELECT id FROM shards WHERE run_id = $1`, [run]))
      await executor.execute(id);
    return run;
  }

  beforeAll(async () => {
    t = await startTestApp();
    kwame = await signInAs(t.app, 'maintainer');
    await approvedSuite(t.db.dataSource, 'path-sqrt', 'sqrt-principal-sz');
    await approvedSuite(t.db.dataSource, 'path-finite-cut', 'sqrt-z2-minus-1-finite-cut');
    runIds.sqrt = await runOf('path-sqrt');
    runIds.finite = await runOf('path-finite-cut');
    await approvedSuite(t.db.dataSource, 'path-agree', 'sqrt-agrees-with-half-power');
    runIds.agree = await runOf('path-agree');
  }, 120_000);
  afterAll(() => t.stop());

  /**
   * A zero-sign failure of the straddle across sqrt's cut, chosen by its path: the table opens
   * newest first, so "the first row" names a different path whenever the order changes.
   */
  async function zeroSignFailureOnTheStraddle(): Promise<{ id: string; pathName: string }> {
    const rows: { id: string; pathName: string }[] = (
      await kwame.get(`/api/failures?run=${runIds.sqrt}&diagnosis=zero-sign&limit=500`)
    ).body.failures;
    return rows.find((f) => f.pathName === 'straddle cut 1')!;
  }

  it('returns every point of the path with the stored failures in place and the principal cut of sqrt', async () => {
    const failure = await zeroSignFailureOnTheStraddle();
    expect(failure).toBeDefined();
    const res = await kwame.get(`/api/failures/${failure.id}/path`);
    expect(res.status).toBe(200);
    const view = res.body as FailurePathView;
    expect(view.path).toMatchObject({ name: failure.pathName, kind: 'straddle' });
    expect(view.points).toHaveLength(view.path.points);
    expect(view.axis).toBe('index');
    expect(view.points[view.focusIndex]).toMatchObject({
      failureId: failure.id,
      outcome: 'fail',
      diagnosis: 'zero-sign',
      actualFrom: 'stored',
    });
    // Every stored failure of this path sits at its own index; everything else passed.
    const stored = (await kwame.get(`/api/failures?run=${runIds.sqrt}&limit=500`)).body.failures.filter(
      (f: { pathName: string }) => f.pathName === failure.pathName,
    );
    expect(
      view.points
        .filter((p) => p.outcome !== 'pass')
        .map((p) => p.failureId)
        .sort(),
    ).toEqual(stored.map((f: { id: string }) => f.id).sort());
    expect(view.counts.fail).toBe(stored.length);
    // sqrt's principal cut is the ray from 0 along the negative real axis.
    expect(view.cuts).toEqual([
      {
        points: [
          { re: 0, im: 0 },
          { re: -1, im: 0 },
        ],
        toInfinity: true,
      },
    ]);
    expect(view.branchPoints).toEqual([{ re: 0, im: 0 }]);
  });

  it('draws a list of points point by point, numbered, with no jumps looked for', async () => {
    const failures = (await kwame.get(`/api/failures?run=${runIds.agree}&limit=500`)).body.failures;
    const onList = failures.find((f: { pathName: string }) => f.pathName === 'on the cut with either zero');
    expect(onList).toBeDefined();
    const view = (await kwame.get(`/api/failures/${onList.id}/path`)).body as FailurePathView;
    expect(view.path).toEqual({ name: 'on the cut with either zero', kind: 'points', points: 8 });
    expect(view.axis).toBe('index');
    // Exactly the eight points written, once each, in order: −4 + 0i and −4 − 0i are two points, not a
    // segment (the view's numbers are JSON numbers, which carry no zero sign).
    expect(view.points.map((p) => p.z?.re)).toEqual([-4, -4, -1, -1, -0.25, -1e300, 4, 4]);
    expect(view.points.map((p) => p.index)).toEqual([0, 1, 2, 3, 4, 5, 6, 7]);
  });

  it('puts the library value of a zero-sign failure on the other side of the cut from the expected one', async () => {
    const failure = await zeroSignFailureOnTheStraddle();
    const view = (await kwame.get(`/api/failures/${failure.id}/path`)).body as FailurePathView;
    const focus = view.points[view.focusIndex]!;
    // √(−x ∓ 0i) = ±i√x: the arguments are +π/2 and −π/2.
    expect(Math.abs(focus.expectedArg!)).toBeCloseTo(Math.PI / 2, 12);
    expect(focus.actualArg).toBeCloseTo(-focus.expectedArg!, 12);
  });

  it('draws a regular branch with the cut of its layout and the jumps of the run', async () => {
    const failures = (await kwame.get(`/api/failures?run=${runIds.finite}&limit=500`)).body.failures;
    expect(failures.length).toBeGreaterThan(0);
    const circle = failures.find((f: { pathName: string }) => !f.pathName.startsWith('across')) ?? failures[0];
    const view = (await kwame.get(`/api/failures/${circle.id}/path`)).body as FailurePathView;
    expect(view.suite).toMatchObject({ branch: 'regular', subject: expect.stringContaining('z') });
    expect(view.cuts).toEqual([
      {
        points: [
          { re: -1, im: 0 },
          { re: 1, im: 0 },
        ],
        toInfinity: false,
      },
    ]);
    expect(view.branchPoints).toEqual([
      { re: -1, im: 0 },
      { re: 1, im: 0 },
    ]);
    expect(
      view.points.every(
        (p) => p.expectedArg === null || (p.expectedArg > -Math.PI - 1e-12 && p.expectedArg <= Math.PI + 1e-12),
      ),
    ).toBe(true);
  });

  it('reads cut points written as a ratio or a hex float (docs/suite-format.md) as the numbers they name', async () => {
    const version = `(SELECT v.id FROM suite_versions v JOIN suites s ON s.id = v.suite_id WHERE s.slug = 'path-finite-cut')`;
    const [{ body }] = await t.db.dataSource.query(`SELECT body FROM suite_versions WHERE id = ${version}`);
    const written = structuredClone(body);
    written.branch.cuts[0].points = [
      { re: '-2/2', im: '0' },
      { re: '0x1p0', im: '0/5' },
    ];
    await t.db.dataSource.query(`UPDATE suite_versions SET body = $1 WHERE id = ${version}`, [written]);
    try {
      const failures = (await kwame.get(`/api/failures?run=${runIds.finite}&limit=5`)).body.failures;
      const view = (await kwame.get(`/api/failures/${failures[0].id}/path`)).body as FailurePathView;
      expect(view.cuts).toEqual([
        {
          points: [
            { re: -1, im: 0 },
            { re: 1, im: 0 },
          ],
          toInfinity: false,
        },
      ]);
    } finally {
      await t.db.dataSource.query(`UPDATE suite_versions SET body = $1 WHERE id = ${version}`, [body]);
    }
  });

  it('reads the expected values its run kept on disk instead of computing them again', async () => {
    const dir = mkdtempSync(path.join(os.tmpdir(), 'sheetkeeper-reference-'));
    try {
      await approvedSuite(t.db.dataSource, 'path-log', 'log-principal-sz');
      const run = await runOf('path-log', dir);
      expect(readdirSync(dir).filter((f) => f.endsWith('.bin')).length).toBeGreaterThan(0);
      const [failure] = (await kwame.get(`/api/failures?run=${run}&limit=1`)).body.failures;
      const view = await failurePath(t.db.dataSource, failure.id, dir);
      expect(view.reference.computed).toBe(0);
      expect(view.reference.cached).toBeGreaterThan(0);
      expect(view.points[view.focusIndex]).toMatchObject({ failureId: failure.id, actualFrom: 'stored' });
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }, 120_000);

  it('computes the expected values when no run kept them', async () => {
    const [failure] = (await kwame.get(`/api/failures?run=${runIds.finite}&limit=1`)).body.failures;
    const view = (await kwame.get(`/api/failures/${failure.id}/path`)).body as FailurePathView;
    expect(view.reference.computed).toBeGreaterThan(0);
  });

  it('answers 404 for a failure that does not exist and 400 for a malformed number', async () => {
    expect((await kwame.get('/api/failures/999999999/path')).status).toBe(404);
    const bad = await kwame.get('/api/failures/abc/path');
    expect(bad.status).toBe(400);
    expect(bad.body.issues).toEqual([{ field: 'params.id', rule: 'must be a failure number' }]);
  });
});

describe('who may classify a failure', () => {
  let t: TestApp;
  let failureId: string;
  beforeAll(async () => {
    t = await startTestApp();
    await approvedSuite(t.db.dataSource, 'classify-sqrt');
    const admin = await signInAs(t.app, 'admin');
    const target = (
      await t.db.dataSource.query(`SELECT name FROM targets WHERE library = 'complex.js' AND installed LIMIT 1`)
    )[0].name;
    const plan = await admin
      .post('/api/plans')
      .send({ name: 'classify plan', recipients: [], suites: ['classify-sqrt'], targets: [target] });
    const runId = (await admin.post('/api/runs').send({ planId: plan.body.plan.id })).body.run.id;
    const [shard] = await t.db.dataSource.query(`SELECT id FROM shards WHERE run_id = $1`, [runId]);
    const [row] = await t.db.dataSource.query(
      `INSERT INTO failures (run_id, shard_id, suite_slug, suite_version, target_name, target_library, target_version, convention, path_name, point_index, t, z, z_hex, point_key, outcome_kind, diagnosis_kind, diagnosis, rule, reproducer)
       VALUES ($1, $2, 'classify-sqrt', 1, $3, 'complex.js', '2.4.3', 'signed-zero', 'p', 0, 0, '{"re":"-4","im":"-0"}', '{"re":"-0x1p+2","im":"-0x0p+0"}', 'classify-sqrt|p|k', 'fail', 'zero-sign', '{"kind":"zero-sign","part":"im","of":"input"}', 'ISO/IEC 9899:2011 G.6.4.2', 'x') RETURNING id::text`,
      [runId, shard.id, target],
    );
    failureId = row.id;
  });
  afterAll(() => t.stop());

  it('lets a maintainer accept a deviation with a reason and an expiry, recorded as theirs', async () => {
    const kwame = await signInAs(t.app, 'maintainer');
    const res = await kwame.post(`/api/failures/${failureId}/classify`).send({
      classification: 'accepted',
      scope: 'point',
      reason: 'complex.js documents that it ignores the sign of zero.',
      expiresAt: '2099-01-01T00:00:00Z',
    });
    expect(res.status).toBe(201);
    expect(res.body.deviation).toMatchObject({
      classification: 'accepted',
      scope: 'point',
      expiresAt: '2099-01-01T00:00:00.000Z',
    });
    const [stored] = await t.db.dataSource.query(
      `SELECT u.email FROM deviations d JOIN users u ON u.id = d.created_by WHERE d.id = $1`,
      [res.body.deviation.id],
    );
    expect(stored.email).toBe('kwame@sheetkeeper.test');
    expect((await kwame.get(`/api/failures?status=accepted`)).body.failures.map((f: { id: string }) => f.id)).toContain(
      failureId,
    );
  });

  it.each(['bug', 'convention-difference'])(
    'refuses a maintainer who calls a failure %s, and stores nothing',
    async (classification) => {
      const kwame = await signInAs(t.app, 'maintainer');
      const before = (await t.db.dataSource.query(`SELECT count(*)::int AS n FROM deviations`))[0].n;
      const res = await kwame
        .post(`/api/failures/${failureId}/classify`)
        .send({ classification, reason: 'looks wrong to me' });
      expect(res.status).toBe(403);
      expect(res.body.kind).toBe('forbidden');
      expect((await t.db.dataSource.query(`SELECT count(*)::int AS n FROM deviations`))[0].n).toBe(before);
    },
  );

  it('still lets a reviewer call a failure a bug', async () => {
    const hanne = await signInAs(t.app, 'reviewer');
    const res = await hanne
      .post(`/api/failures/${failureId}/classify`)
      .send({ classification: 'bug', reason: 'reported upstream' });
    expect(res.status).toBe(201);
  });

  it('still refuses a contributor, even for an accepted deviation', async () => {
    const ravi = await signInAs(t.app, 'contributor');
    const res = await ravi
      .post(`/api/failures/${failureId}/classify`)
      .send({ classification: 'accepted', reason: 'fine by me', expiresAt: '2099-01-01T00:00:00Z' });
    expect(res.status).toBe(403);
  });
});
