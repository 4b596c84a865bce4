import request from 'supertest';
import { databaseOutage, type DatabaseOutage } from '../../setup/database-outage';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

/**
 * PostgreSQL going away under a running app, on this file's private database only (the shared
 * cluster stays up for the other files): its backends are terminated (57P01, as on a restart)
 * and it refuses new connections until it is let back in.
 */
let app: TestApp;
let outage: DatabaseOutage;

beforeAll(async () => {
  app = await startTestApp();
  outage = databaseOutage(app.db.url);
});

afterAll(async () => {
  await outage.end();
  await app.stop();
});

/** Past the 2 s for which the app trusts a session row it has read, so the next request reads it again. */
const SESSION_CACHE_WAIT_MS = 2100;

test('a database outage answers 503 with a plain message, and the app serves again by itself once PostgreSQL is back', async () => {
  const logged = jest.spyOn(console, 'error').mockImplementation(() => {});
  const agent = await signInAs(app.app, 'maintainer');
  // Both pools (sessions and TypeORM's) now hold idle connections, which the termination kills.
  expect((await agent.get('/api/suites')).status).toBe(200);

  await outage.begin();
  // node-postgres reports the killed idle connections as 'error' events on their pools; without a
  // listener that event ended the process. Give them time to arrive.
  await new Promise((resolve) => setTimeout(resolve, SESSION_CACHE_WAIT_MS));

  for (const path of ['/api/suites', '/api/me', '/api/overview']) {
    const down = await agent.get(path);
    expect({ path, status: down.status, kind: down.body.kind }).toEqual({ path, status: 503, kind: 'unavailable' });
    expect(down.body.message).toMatch(/database cannot be reached/);
    expect(down.headers['retry-after']).toBe('5');
  }
  // Signed out too: the sign-in reads the users table.
  const signIn = await request(app.app).post('/api/auth/sign-in').send({ email: 'x@example.org', password: 'y' });
  expect(signIn.status).toBe(503);

  // Each lost connection is a log line, not an exception.
  expect(logged.mock.calls.map((c) => String(c[0])).join('\n')).toMatch(/a database connection was lost.*57P01/);

  await outage.end();
  const back = await agent.get('/api/suites');
  expect(back.status).toBe(200);
  expect((await agent.get('/api/me')).status).toBe(200);
  logged.mockRestore();
});
