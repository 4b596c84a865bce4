import type request from 'supertest';
import { STORABLE_TEXT_RULE } from '../../../shared/schemas/text-schema';
import type { TargetSourceView } from '../../../shared/target-source-view';
import { approvedSuite } from '../../setup/approved-suite';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

/**
 * Targets added by admins (docs/libraries-screen.md). The program is Python's cmath adapter, the
 * project's own stdio worked example, started by Debian's python3; each add starts it once (~60 ms).
 */
const CMATH = ['/usr/bin/python3', 'harness/adapters/python/cmath_adapter.py'];

let t: TestApp;
let admin: request.Agent;
let reviewer: request.Agent;

beforeAll(async () => {
  t = await startTestApp();
  [admin, reviewer] = [await signInAs(t.app, 'admin'), await signInAs(t.app, 'reviewer')];
});
afterAll(() => t.stop());

const sourceCount = async (): Promise<number> =>
  Number((await t.db.dataSource.query(`SELECT count(*) AS n FROM target_sources`))[0].n);
const listed = async (id: string): Promise<TargetSourceView | undefined> =>
  ((await reviewer.get('/api/target-sources')).body.sources as TargetSourceView[]).find((s) => s.id === id);
/** Adds a source and waits for the server's background resolution to finish with it. */
async function addAndSettle(source: object): Promise<TargetSourceView> {
  const res = await admin.post('/api/target-sources').send(source);
  expect(res.status).toBe(202);
  await t.targetSources.idle();
  return (await listed(res.body.source.id))!;
}
const targetRow = async (name: string) =>
  (await t.db.dataSource.query(`SELECT installed FROM targets WHERE name = $1`, [name]))[0] as
    { installed: boolean } | undefined;

describe('target sources', () => {
  it('accepts a program at once, resolves it in the background, and lists its target with its entries', async () => {
    const res = await admin
      .post('/api/target-sources')
      .send({ kind: 'program', command: CMATH, name: 'cmath-added@1' });
    expect(res.status).toBe(202);
    expect(res.body.source).toMatchObject({ state: 'resolving', targetNames: [], addedBy: expect.any(String) });
    await t.targetSources.idle();

    const ready = await listed(res.body.source.id);
    expect(ready).toMatchObject({ state: 'ready', targetNames: ['cmath-added@1'], error: null });
    const targets = (await reviewer.get('/api/targets')).body.targets as {
      name: string;
      library: string;
      installed: boolean;
      entries?: unknown[];
    }[];
    const added = targets.find((x) => x.name === 'cmath-added@1');
    expect(added).toMatchObject({ library: 'cmath', installed: true });
    expect(added?.entries?.length).toBeGreaterThan(0);
  });

  it("computes an added target's convention fingerprint, resolving it on the findings thread", async () => {
    const res = await reviewer
      .get(`/api/targets/${encodeURIComponent('cmath-added@1')}/fingerprint`)
      .query({ fn: 'sqrt' });
    expect(res.status).toBe(200);
    expect(res.body.fingerprint).toMatchObject({ target: 'cmath-added@1', missing: [] });
    // cmath follows Annex G: sqrt's cut (−∞, 0] is continuous from the side of the zero's sign.
    expect(res.body.fingerprint.cuts[0]).toMatchObject({ function: 'sqrt', behaviour: 'signed-zero' });
  });

  it('lets only admins add and remove, and every signed-in role read the list', async () => {
    const body = { kind: 'program', command: ['/nonexistent/never-started'] };
    expect((await reviewer.post('/api/target-sources').send(body)).status).toBe(403);
    expect((await reviewer.delete('/api/target-sources/00000000-0000-4000-8000-000000000000')).status).toBe(403);
    expect((await reviewer.get('/api/target-sources')).status).toBe(200);
    expect(await listed('00000000-0000-4000-8000-000000000000')).toBeUndefined();
  });

  it.each([
    ['a NUL in a local path', { kind: 'local', path: '/srv/lib\u0000x' }, 'body.path', STORABLE_TEXT_RULE],
    ['a lone surrogate in a command', { kind: 'program', command: ['py\ud800'] }, 'body.command.0', STORABLE_TEXT_RULE],
    [
      'a lone surrogate in a name',
      { kind: 'npm', package: 'complex.js', version: '2.4.3', name: 'a\udc00' },
      'body.name',
      STORABLE_TEXT_RULE,
    ],
    ['a huge path', { kind: 'local', path: 'x'.repeat(5000) }, 'body.path', expect.any(String)],
    [
      'a version range',
      { kind: 'npm', package: 'complex.js', version: '^2.4.0' },
      'body.version',
      expect.stringMatching(/exact version/),
    ],
    ['an unknown kind', { kind: 'ftp', path: '/x' }, 'body.kind', expect.any(String)],
    ['an unknown field', { kind: 'local', path: '/x', shell: true }, 'body', expect.stringMatching(/shell/)],
    ['an empty command', { kind: 'program', command: [] }, 'body.command', expect.any(String)],
    [
      'a time limit past 10 minutes',
      { kind: 'program', command: ['x'], timeLimitMs: 1e300 },
      'body.timeLimitMs',
      expect.any(String),
    ],
  ])('refuses %s with 400 naming the field, and stores nothing', async (_what, body, field, rule) => {
    const before = await sourceCount();
    const res = await admin.post('/api/target-sources').send(body);
    expect(res.status).toBe(400);
    expect(res.body.issues).toContainEqual({ field, rule });
    expect(await sourceCount()).toBe(before);
  });

  it('refuses a body past the 256 KB limit with 413, and stores nothing', async () => {
    const before = await sourceCount();
    const res = await admin.post('/api/target-sources').send({ kind: 'local', path: 'x'.repeat(300_000) });
    expect(res.status).toBe(413);
    expect(res.body.kind).toBe('payload-too-large');
    expect(await sourceCount()).toBe(before);
  });

  it("refuses an add from another origin's page before reading it", async () => {
    const before = await sourceCount();
    const res = await admin
      .post('/api/target-sources')
      .set('Origin', 'http://127.0.0.1:9999')
      .send({ kind: 'program', command: ['/nonexistent/foreign'] });
    expect(res.status).toBe(403);
    expect(res.body.kind).toBe('forbidden');
    expect(await sourceCount()).toBe(before);
  });

  it('refuses the same source twice with 409, in any key order', async () => {
    const first = await admin.post('/api/target-sources').send({ kind: 'program', command: ['/nonexistent/twice'] });
    expect(first.status).toBe(202);
    const again = await admin.post('/api/target-sources').send({ command: ['/nonexistent/twice'], kind: 'program' });
    expect(again.status).toBe(409);
    expect(again.body.kind).toBe('conflict');
    await t.targetSources.idle();
  });

  it('marks a program that does not start as failed with the reason, and records no target', async () => {
    const before = Number((await t.db.dataSource.query(`SELECT count(*) AS n FROM targets`))[0].n);
    const failed = await addAndSettle({
      kind: 'program',
      command: ['/usr/bin/python3', '-c', 'import sys; sys.exit(3)'],
    });
    expect(failed.state).toBe('failed');
    expect(failed.error).toMatch(/\S/);
    expect(failed.targetNames).toEqual([]);
    expect(Number((await t.db.dataSource.query(`SELECT count(*) AS n FROM targets`))[0].n)).toBe(before);
  });

  it('fails a source whose target name is taken by an installed target, and asks for a name of its own', async () => {
    // Without a name, the cmath adapter names itself cmath@<Python version>, the built-in target's name.
    const clash = await addAndSettle({ kind: 'program', command: CMATH });
    expect(clash.state).toBe('failed');
    expect(clash.error).toMatch(/exists already: give this source a name of its own/);
  });

  it('removes a source: its target is marked not installed and a plan naming it keeps the name', async () => {
    const ready = await addAndSettle({ kind: 'program', command: CMATH, name: 'cmath-to-remove@1' });
    expect(ready.state).toBe('ready');
    await approvedSuite(t.db.dataSource, 'added-target-suite');
    const plan = await admin.post('/api/plans').send({
      name: 'added target plan',
      recipients: [],
      suites: ['added-target-suite'],
      targets: ['cmath-to-remove@1'],
    });
    expect(plan.status).toBe(201);

    expect((await admin.delete(`/api/target-sources/${ready.id}`)).status).toBe(204);
    expect(await listed(ready.id)).toBeUndefined();
    expect(await targetRow('cmath-to-remove@1')).toEqual({ installed: false });
    const kept = await admin.get(`/api/plans/${plan.body.plan.id}`);
    expect(JSON.stringify(kept.body)).toContain('cmath-to-remove@1');
    expect((await admin.delete(`/api/target-sources/${ready.id}`)).status).toBe(404);
  });

  it('refuses a malformed id with the field', async () => {
    const res = await admin.delete('/api/target-sources/not-a-uuid');
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([{ field: 'params.id', rule: 'must be a UUID' }]);
  });
});
