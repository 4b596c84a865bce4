import 'reflect-metadata';
import { execFileSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import path from 'node:path';
import { Client } from 'pg';
import PgBoss from 'pg-boss';
import { PROJECT_ROOT } from '../../server/config';
import { createDataSource } from '../../server/data-source';
import { pgAdminUrl } from '../setup/pg-admin-url';
import { pgBaseUrl } from '../setup/pg-base-url';

/**
 * A database made by an older scripts/lib.sh: created, migrated and given pg-boss's schema by the
 * superuser, which the application used to connect as. `npm start` and `npm test` hand it to the
 * least-privilege role (lib.sh's hand_database_to_app, through ensure_database) in place.
 */
const name = `sheetkeeper_t_old_${randomBytes(4).toString('hex')}`;

async function asAdmin(sql: string, database = 'postgres'): Promise<void> {
  const admin = new Client({ connectionString: `${pgAdminUrl()}/${database}` });
  await admin.connect();
  try {
    await admin.query(sql);
  } finally {
    await admin.end();
  }
}

async function startBoss(url: string): Promise<void> {
  const boss = new PgBoss({ connectionString: url, max: 1, supervise: false, schedule: false });
  boss.on('error', () => undefined);
  await boss.start();
  await boss.createQueue('upgrade-probe');
  await boss.stop({ graceful: false, wait: true });
}

function handOver(): void {
  execFileSync(
    'bash',
    [
      '-c',
      `source "${path.join(PROJECT_ROOT, 'scripts', 'lib.sh')}" && PGROOT="$(pg_root)" && hand_database_to_app "$DB"`,
    ],
    { env: { ...process.env, DB: name }, timeout: 60_000, stdio: ['ignore', 'ignore', 'pipe'] },
  );
}

beforeAll(async () => {
  await asAdmin(`CREATE DATABASE ${name}`);
  const old = createDataSource(`${pgAdminUrl()}/${name}`);
  await old.initialize();
  try {
    await old.runMigrations({ transaction: 'each' });
  } finally {
    await old.destroy();
  }
  await startBoss(`${pgAdminUrl()}/${name}`);
}, 60_000);

afterAll(async () => {
  await asAdmin(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
});

test('a database made by the superuser is handed to the application role, which can then migrate it and run pg-boss in it', async () => {
  const appUrl = `${pgBaseUrl()}/${name}`;
  const before = createDataSource(appUrl);
  await before.initialize();
  const quiet = jest.spyOn(console, 'error').mockImplementation(() => {});
  try {
    await expect(before.query('SELECT count(*) FROM users')).rejects.toMatchObject({ driverError: { code: '42501' } });
  } finally {
    quiet.mockRestore();
    await before.destroy();
  }

  handOver();
  handOver(); // idempotent: npm start and npm test run it every time

  const app = createDataSource(appUrl);
  await app.initialize();
  try {
    const foreign = await app.query(
      `SELECT n.nspname, c.relname, c.relkind, pg_get_userbyid(c.relowner) AS owner
         FROM pg_class c JOIN pg_namespace n ON n.oid = c.relnamespace
        WHERE n.nspname IN ('public', 'pgboss') AND pg_get_userbyid(c.relowner) <> current_user`,
    );
    expect(foreign).toEqual([]);
    expect(await app.showMigrations()).toBe(false);
    // What a future migration does: alter a table it did not create.
    await app.query('ALTER TABLE users ADD COLUMN upgrade_probe int; ALTER TABLE users DROP COLUMN upgrade_probe');
    expect((await app.query('SELECT count(*)::int AS n FROM users'))[0].n).toBeGreaterThanOrEqual(0);
  } finally {
    await app.destroy();
  }
  await startBoss(appUrl);
});
