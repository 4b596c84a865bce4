import http from 'node:http';
import type { AddressInfo } from 'node:net';
import request from 'supertest';
import { DEMO_USERS } from '../../../server/seed/demo-users';
import { startTestApp, type TestApp } from '../../setup/test-app';

const LIMITS = {
  perAccountAndClient: 3,
  perClient: 50,
  perAccountBeforeSpacing: 4,
  // Long enough that the next request reliably lands inside the slot on a loaded machine: one
  // failed attempt (a bcrypt compare) took up to ~1.5 s while other test files ran beside it.
  accountSpacingSeconds: 5,
  windowSeconds: 60,
};

function account(email: string): { email: string; password: string } {
  const demo = DEMO_USERS.find((u) => u.email === email)!;
  return { email: demo.email, password: demo.password };
}

/** A sign-in sent from a chosen loopback address (Linux answers on all of 127.0.0.0/8). */
function signInFrom(port: number, localAddress: string, body: { email: string; password: string }): Promise<number> {
  const payload = JSON.stringify(body);
  return new Promise((resolve, reject) => {
    const req = http.request(
      {
        host: '127.0.0.1',
        port,
        localAddress,
        method: 'POST',
        path: '/api/auth/sign-in',
        headers: { 'content-type': 'application/json', 'content-length': Buffer.byteLength(payload) },
        timeout: 10_000,
      },
      (res) => {
        res.resume();
        res.on('end', () => resolve(res.statusCode ?? 0));
      },
    );
    req.on('error', reject);
    req.on('timeout', () => req.destroy(new Error('sign-in timed out')));
    req.end(payload);
  });
}

describe('the sign-in limiter with trust proxy off (the default)', () => {
  let t: TestApp;
  let server: http.Server;
  let port: number;
  beforeAll(async () => {
    t = await startTestApp({ signInLimits: LIMITS });
    server = t.app.listen(0, '127.0.0.1');
    await new Promise((resolve) => server.once('listening', resolve));
    port = (server.address() as AddressInfo).port;
  });
  afterAll(async () => {
    await new Promise((resolve) => server.close(resolve));
    await t.stop();
  });

  it('locks one peer out of an account after its failures, while another peer signs in to that account', async () => {
    const kwame = account('kwame@sheetkeeper.test');
    for (let i = 0; i < 3; i += 1)
      expect(await signInFrom(port, '127.0.0.2', { ...kwame, password: `guess-${i}` })).toBe(401);
    expect(await signInFrom(port, '127.0.0.2', kwame)).toBe(429);
    expect(await signInFrom(port, '127.0.0.3', kwame)).toBe(200);
  });

  it('ignores X-Forwarded-For, so a locked client cannot name itself another one', async () => {
    const hanne = account('hanne@sheetkeeper.test');
    for (let i = 0; i < 3; i += 1)
      expect(
        (
          await request(t.app)
            .post('/api/auth/sign-in')
            .send({ ...hanne, password: `guess-${i}` })
        ).status,
      ).toBe(401);
    const spoofed = await request(t.app).post('/api/auth/sign-in').set('X-Forwarded-For', '10.9.9.9').send(hanne);
    expect(spoofed.status).toBe(429);
  });
});

describe('the sign-in limiter behind a trusted proxy on loopback', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({ signInLimits: LIMITS, trustProxy: 'loopback' });
  });
  afterAll(() => t.stop());

  const from = (client: string, body: { email: string; password: string }) =>
    request(t.app).post('/api/auth/sign-in').set('X-Forwarded-For', client).send(body);

  it('counts failures per forwarded client: wrong passwords from one client leave the account open to the others', async () => {
    const kwame = account('kwame@sheetkeeper.test');
    for (let i = 0; i < 3; i += 1) expect((await from('10.0.0.1', { ...kwame, password: `g${i}` })).status).toBe(401);
    expect((await from('10.0.0.1', kwame)).status).toBe(429);
    expect((await from('10.0.0.2', kwame)).status).toBe(200);
  });

  it("never lets one account's lock block that client's sign-in to another account", async () => {
    const mei = account('mei@sheetkeeper.test');
    for (let i = 0; i < 3; i += 1) expect((await from('10.0.1.1', { ...mei, password: `g${i}` })).status).toBe(401);
    expect((await from('10.0.1.1', mei)).status).toBe(429);
    expect((await from('10.0.1.1', account('ravi@sheetkeeper.test'))).status).toBe(200);
  });

  it('slows a brute force on one account spread over many clients to one attempt per spacing period, without locking the owner out', async () => {
    const odile = account('odile@sheetkeeper.test');
    // Four clients, one wrong guess each: under every per-client limit, but the account's threshold is reached.
    for (let i = 0; i < 4; i += 1)
      expect((await from(`10.0.2.${i + 1}`, { ...odile, password: `g${i}` })).status).toBe(401);
    expect((await from('10.0.2.5', { ...odile, password: 'g4' })).status).toBe(401);
    // Even the right password from a fresh client waits for the account's next slot…
    const slowed = await from('10.0.2.6', odile);
    expect(slowed.status).toBe(429);
    const wait = Number(slowed.headers['retry-after']);
    expect(wait).toBeGreaterThanOrEqual(1);
    expect(wait).toBeLessThanOrEqual(5);
    expect(slowed.body.message).toBe(`Too many failed attempts. Try again in ${wait} s.`);
    // …and gets in once that slot comes.
    await new Promise((resolve) => setTimeout(resolve, wait * 1000 + 200));
    expect((await from('10.0.2.6', odile)).status).toBe(200);
  });
});
