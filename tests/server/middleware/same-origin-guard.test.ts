import request from 'supertest';
import { SESSION_COOKIE } from '../../../server/create-app';
import { approvedSuite } from '../../setup/approved-suite';
import { demoSuiteBody } from '../../setup/demo-suite-body';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

/** A page served by another program on this machine: same site as the app, another origin. */
const FOREIGN = 'http://127.0.0.1:8999';
const OWN = 'http://127.0.0.1:8460';

describe('requests that change data from pages of another origin', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
    await approvedSuite(t.db.dataSource, 'csrf-target');
  });
  afterAll(() => t.stop());

  async function status(slug: string): Promise<string | undefined> {
    const rows: { status: string }[] = await t.db.dataSource.query(
      `SELECT v.status FROM suite_versions v JOIN suites s ON s.id = v.suite_id WHERE s.slug = $1 ORDER BY v.version DESC LIMIT 1`,
      [slug],
    );
    return rows[0]?.status;
  }

  it('refuses an auto-submitted form that would retire an approved suite, and the suite stays approved', async () => {
    const hanne = await signInAs(t.app, 'reviewer');
    const res = await hanne
      .post('/api/suites/csrf-target/versions/1/retire')
      .set('Origin', FOREIGN)
      .type('form')
      .send('x=1');
    expect(res.status).toBe(403);
    expect(res.body.kind).toBe('forbidden');
    expect(res.body.message).toContain(`Origin ${FOREIGN}`);
    expect(await status('csrf-target')).toBe('approved');
  });

  it('refuses a no-cors multipart upload that would plant a suite, and no suite or upload row appears', async () => {
    const ravi = await signInAs(t.app, 'contributor');
    const file = Buffer.from(JSON.stringify(demoSuiteBody('csrf-planted')));
    const res = await ravi
      .post('/api/suites/upload')
      .set('Origin', FOREIGN)
      .attach('file', file, { filename: 'planted.json', contentType: 'text/plain' });
    expect(res.status).toBe(403);
    expect(await status('csrf-planted')).toBeUndefined();
    const uploads = await t.db.dataSource.query(
      `SELECT count(*)::int AS n FROM uploads WHERE filename = 'planted.json'`,
    );
    expect(uploads[0].n).toBe(0);
  });

  it('judges by Referer when Origin is missing, and treats Origin null as foreign', async () => {
    const hanne = await signInAs(t.app, 'reviewer');
    const byReferer = await hanne.post('/api/suites/csrf-target/versions/1/retire').set('Referer', `${FOREIGN}/x`);
    expect(byReferer.status).toBe(403);
    expect(byReferer.body.message).toContain(`Referer ${FOREIGN}/x`);
    const nullOrigin = await hanne.post('/api/suites/csrf-target/versions/1/retire').set('Origin', 'null');
    expect(nullOrigin.status).toBe(403);
    expect(await status('csrf-target')).toBe('approved');
  });

  it('refuses a sign-in from another origin without starting a session', async () => {
    const res = await request(t.app)
      .post('/api/auth/sign-in')
      .set('Origin', FOREIGN)
      .send({ email: 'ravi@sheetkeeper.test', password: 'ravi-demo-2026' });
    expect(res.status).toBe(403);
    const cookies = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
    expect(cookies.some((c) => c.startsWith(`${SESSION_COOKIE}=`))).toBe(false);
  });

  it("accepts the app's own pages under each loopback name, by Origin or by Referer", async () => {
    const ravi = await signInAs(t.app, 'contributor');
    for (const [i, origin] of [OWN, 'http://localhost:8460', 'http://[::1]:8460'].entries()) {
      const res = await ravi
        .post('/api/suites')
        .set('Origin', origin)
        .send(demoSuiteBody(`csrf-own-${i}`));
      expect(res.status).toBe(201);
    }
    const byReferer = await ravi
      .post('/api/suites')
      .set('Referer', `${OWN}/suites/new`)
      .send(demoSuiteBody('csrf-own-referer'));
    expect(byReferer.status).toBe(201);
  });

  it('accepts a bearer-token request whatever its Origin, since a page cannot attach the token', async () => {
    const ravi = await signInAs(t.app, 'contributor');
    const made = await ravi.post('/api/tokens').send({ name: 'nightly ci' });
    expect(made.status).toBe(201);
    const { secret } = made.body;
    const res = await request(t.app)
      .post('/api/suites')
      .set('Authorization', `Bearer ${secret}`)
      .set('Origin', FOREIGN)
      .send(demoSuiteBody('csrf-by-token'));
    expect(res.status).toBe(201);
    expect(await status('csrf-by-token')).toBe('draft');
  });

  it('accepts a request with neither Origin nor Referer, as programs (the CLI, curl) send them', async () => {
    const ravi = await signInAs(t.app, 'contributor');
    expect((await ravi.post('/api/suites').send(demoSuiteBody('csrf-no-header'))).status).toBe(201);
  });

  it('lets reads through from any origin (they change nothing)', async () => {
    const ravi = await signInAs(t.app, 'contributor');
    expect((await ravi.get('/api/me').set('Origin', FOREIGN)).status).toBe(200);
  });
});
