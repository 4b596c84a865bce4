import { Client } from 'pg';
import { pgAdminUrl } from './pg-admin-url';
import { templateDatabase } from './template-database';

/** Drops this run's template database. */
export default async function globalTeardown(): Promise<void> {
  const admin = new Client({ connectionString: `${pgAdminUrl()}/postgres` });
  await admin.connect();
  try {
    await admin.query(`DROP DATABASE IF EXISTS ${templateDatabase()} WITH (FORCE)`);
  } finally {
    await admin.end();
  }
}
