import 'reflect-metadata';
import { Client } from 'pg';
import { createDataSource } from '../../server/data-source';
import { seedDemo } from '../../server/seed/seed-demo';
import { syncTargets } from '../../server/targets/sync-targets';
import { appRole } from './app-role';
import { pgAdminUrl } from './pg-admin-url';
import { pgBaseUrl } from './pg-base-url';
import { templateDatabase } from './template-database';

/**
 * Builds the template database once per jest run: migrated with the real
 * migrations and seeded with the demo users and the installed targets (so bcrypt and target
 * discovery run once, not per file). Suites and plans are left to each test.
 */
export default async function globalSetup(): Promise<void> {
  process.env.SHEETKEEPER_TEST_TEMPLATE = `sheetkeeper_template_${process.pid}`;
  const template = templateDatabase();
  const admin = new Client({ connectionString: `${pgAdminUrl()}/postgres` });
  await admin.connect();
  try {
    await admin.query(`DROP DATABASE IF EXISTS ${template} WITH (FORCE)`);
    // Owned by the application's role, as lib.sh makes the real databases: the app under test
    // migrates it and connects as that role, never as the superuser.
    await admin.query(`CREATE DATABASE ${template} OWNER ${appRole()}`);
  } finally {
    await admin.end();
  }
  const dataSource = createDataSource(`${pgBaseUrl()}/${template}`);
  await dataSource.initialize();
  try {
    await dataSource.runMigrations({ transaction: 'each' });
    await seedDemo(dataSource);
    await syncTargets(dataSource);
  } finally {
    await dataSource.destroy();
  }
}
