import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { DEMO_USERS } from '../../server/seed/demo-users';
import { databaseOutage, type DatabaseOutage } from '../setup/database-outage';
import { createTestDatabase, type TestDatabase } from '../setup/test-database';

const ROOT = path.join(__dirname, '..', '..');

/**
 * The real server process (`server/main.ts`, with its shard worker, mail loop, scheduler and
 * local mail store) through a database outage: before its pools had 'error' listeners, the
 * first terminated idle connection ended the process ("Unhandled 'error' event … 57P01").
 */
let db: TestDatabase;
let outage: DatabaseOutage;
let server: ChildProcess;
let output = '';
let exited: string | null = null;

async function until<T>(
  what: string,
  probe: () => Promise<T | null | false> | T | null | false,
  ms: number,
): Promise<T> {
  const end = Date.now() + ms;
  while (Date.now() < end) {
    const got = await probe();
    if (got) return got;
    if (exited) throw new Error(`the server ${exited} while waiting for ${what}:\n${output}`);
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`waited ${ms} ms for ${what}:\n${output}`);
}

beforeAll(async () => {
  db = await createTestDatabase();
  outage = databaseOutage(db.url);
  server = spawn(process.execPath, ['--import', 'tsx', 'server/main.ts'], {
    cwd: ROOT,
    env: {
      ...process.env,
      DATABASE_URL: db.url,
      SHEETKEEPER_PORT: '0',
      SHEETKEEPER_SMTP_PORT: '0',
      SHEETKEEPER_WORKERS: '1',
      SHEETKEEPER_WEB_DIR: path.join(ROOT, 'no-web-export'),
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  server.stdout?.on('data', (d: Buffer) => (output += d.toString()));
  server.stderr?.on('data', (d: Buffer) => (output += d.toString()));
  server.on('exit', (code, signal) => (exited = `exited (code ${code}, signal ${signal})`));
}, 60_000);

afterAll(async () => {
  await outage.end();
  if (!exited) {
    server.kill('SIGTERM');
    await until('the server to stop', () => exited !== null, 15_000).catch(() => server.kill('SIGKILL'));
  }
  await db.drop();
}, 60_000);

const demo = DEMO_USERS[0]!;
const signIn = (base: string) =>
  fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base },
    body: JSON.stringify({ email: demo.email, password: demo.password }),
  });

test('the server process survives PostgreSQL dropping its connections, answers 503 meanwhile, and serves again by itself', async () => {
  const base = await until<string>(
    'the server to listen',
    () => /serving (http:\/\/\S+?)\/?\n/.exec(output)?.[1] ?? null,
    45_000,
  );
  expect((await signIn(base)).status).toBe(200);

  await outage.begin();
  // Longer than the mail loop's 5 s interval and many of the shard worker's 1 s polls, so every
  // background part meets the outage too.
  await new Promise((r) => setTimeout(r, 6500));
  expect(exited).toBeNull();
  const down = await signIn(base);
  expect(down.status).toBe(503);
  expect(((await down.json()) as { kind: string }).kind).toBe('unavailable');

  await outage.end();
  await until('a sign-in to succeed again', async () => (await signIn(base)).status === 200, 15_000);
  expect(exited).toBeNull();
}, 90_000);
