import { Client } from 'pg';
import { pgBaseUrl } from './pg-base-url';
import { templateDatabase } from './template-database';

/** Drops this run's template database. */
export default async function globalTeardown(): Promise<void> {
  const admin = new Client({ connectionString: `${pgBaseUrl()}/postgres` });
  await admin.connect();
  try {
    await admin.query(`DROP DATABASE IF EXISTS ${templateDatabase()} WITH (FORCE)`);
  } finally {
    await admin.end();
  }
}
