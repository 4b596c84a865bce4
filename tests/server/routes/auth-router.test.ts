import request from 'supertest';
import { SESSION_COOKIE } from '../../../server/create-app';
import { startTestApp, type TestApp } from '../../setup/test-app';

const RAVI = { email: 'ravi@sheetkeeper.test', password: 'ravi-demo-2026' };

function sessionCookie(res: request.Response): string | undefined {
  const cookies = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
  return cookies.find((c) => c.startsWith(`${SESSION_COOKIE}=`));
}

describe('auth routes', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({
      signInLimits: {
        perAccountAndClient: 3,
        perClient: 50,
        perAccountBeforeSpacing: 50,
        accountSpacingSeconds: 1,
        windowSeconds: 60,
      },
    });
  });
  afterAll(() => t.stop());

  it('sets an httpOnly, SameSite=Lax session cookie and answers with the user', async () => {
    const res = await request(t.app).post('/api/auth/sign-in').send(RAVI);
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ email: RAVI.email, role: 'contributor', displayName: 'Ravi Dutta' });
    expect(res.body.user.passwordHash).toBeUndefined();
    const cookie = sessionCookie(res);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
  });

  it('accepts the e-mail in any case and with spaces around it', async () => {
    const res = await request(t.app)
      .post('/api/auth/sign-in')
      .send({ email: '  RAVI@Sheetkeeper.test ', password: RAVI.password });
    expect(res.status).toBe(200);
  });

  it('gives a new session id at sign-in and the old one stops working', async () => {
    const agent = request.agent(t.app);
    const first = sessionCookie(await agent.post('/api/auth/sign-in').send(RAVI))!.split(';')[0]!;
    const second = sessionCookie(await agent.post('/api/auth/sign-in').send(RAVI))!.split(';')[0]!;
    expect(second).not.toBe(first);
    expect((await request(t.app).get('/api/me').set('Cookie', first)).status).toBe(401);
    expect((await request(t.app).get('/api/me').set('Cookie', second)).status).toBe(200);
  });

  it('destroys the session at sign-out, so its cookie no longer signs anyone in', async () => {
    const signIn = await request(t.app).post('/api/auth/sign-in').send(RAVI);
    const cookie = sessionCookie(signIn)!.split(';')[0]!;
    expect((await request(t.app).get('/api/me').set('Cookie', cookie)).status).toBe(200);
    expect((await request(t.app).post('/api/auth/sign-out').set('Cookie', cookie)).status).toBe(204);
    expect((await request(t.app).get('/api/me').set('Cookie', cookie)).status).toBe(401);
    const rows = await t.db.dataSource.query(`SELECT count(*)::int AS n FROM sessions WHERE sid = $1`, [
      decodeURIComponent(cookie.split('=')[1]!).slice(2).split('.')[0],
    ]);
    expect(rows[0].n).toBe(0);
  });

  it('answers an unknown account and a wrong password with the same status and body', async () => {
    const unknown = await request(t.app)
      .post('/api/auth/sign-in')
      .send({ email: 'nobody@sheetkeeper.test', password: 'whatever' });
    const wrong = await request(t.app)
      .post('/api/auth/sign-in')
      .send({ email: 'hanne@sheetkeeper.test', password: 'not-her-password' });
    expect(unknown.status).toBe(401);
    expect(wrong.status).toBe(401);
    expect(unknown.body).toEqual(wrong.body);
    expect(sessionCookie(wrong)).toBeUndefined();
  });

  it('blocks an account from one client after the allowed failures, even with the right password', async () => {
    const kwame = { email: 'kwame@sheetkeeper.test', password: 'kwame-demo-2026' };
    for (let i = 0; i < 3; i += 1) {
      expect(
        (
          await request(t.app)
            .post('/api/auth/sign-in')
            .send({ ...kwame, password: `guess-${i}` })
        ).status,
      ).toBe(401);
    }
    const blocked = await request(t.app).post('/api/auth/sign-in').send(kwame);
    expect(blocked.status).toBe(429);
    expect(blocked.body.kind).toBe('too-many-attempts');
    expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(0);
  });

  it('forgets earlier failures after a successful sign-in', async () => {
    const odile = { email: 'odile@sheetkeeper.test', password: 'odile-demo-2026' };
    for (let round = 0; round < 2; round += 1) {
      for (let i = 0; i < 2; i += 1)
        expect(
          (
            await request(t.app)
              .post('/api/auth/sign-in')
              .send({ ...odile, password: 'nope' })
          ).status,
        ).toBe(401);
      expect((await request(t.app).post('/api/auth/sign-in').send(odile)).status).toBe(200);
    }
  });
});

describe('sign-in limit per client', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({
      signInLimits: {
        perAccountAndClient: 100,
        perClient: 4,
        perAccountBeforeSpacing: 100,
        accountSpacingSeconds: 1,
        windowSeconds: 60,
      },
    });
  });
  afterAll(() => t.stop());

  it('blocks the client after failures spread over many accounts', async () => {
    for (let i = 0; i < 4; i += 1) {
      expect(
        (
          await request(t.app)
            .post('/api/auth/sign-in')
            .send({ email: `someone${i}@sheetkeeper.test`, password: 'x' })
        ).status,
      ).toBe(401);
    }
    const res = await request(t.app).post('/api/auth/sign-in').send(RAVI);
    expect(res.status).toBe(429);
  });
});
