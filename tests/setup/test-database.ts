import 'reflect-metadata';
import { randomBytes } from 'node:crypto';
import { Client } from 'pg';
import type { DataSource } from 'typeorm';
import { createDataSource } from '../../server/data-source';
import { appRole } from './app-role';
import { pgAdminUrl } from './pg-admin-url';
import { pgBaseUrl } from './pg-base-url';
import { templateDatabase } from './template-database';

export interface TestDatabase {
  url: string;
  dataSource: DataSource;
  drop(): Promise<void>;
}

async function withAdmin<T>(work: (client: Client) => Promise<T>): Promise<T> {
  const client = new Client({ connectionString: `${pgAdminUrl()}/postgres` });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

/**
 * A private copy of the template database for one test file, so files can run in
 * parallel and change data freely. `empty: true` gives a database with no tables. Created by the
 * administrative role, owned by and connected to as the application's least-privilege role.
 */
export async function createTestDatabase(options: { empty?: boolean } = {}): Promise<TestDatabase> {
  const name = `sheetkeeper_t_${randomBytes(5).toString('hex')}`;
  await withAdmin((c) =>
    c.query(
      options.empty
        ? `CREATE DATABASE ${name} OWNER ${appRole()}`
        : `CREATE DATABASE ${name} TEMPLATE ${templateDatabase()} OWNER ${appRole()}`,
    ),
  );
  const url = `${pgBaseUrl()}/${name}`;
  const dataSource = createDataSource(url);
  await dataSource.initialize();
  return {
    url,
    dataSource,
    drop: async () => {
      await dataSource.destroy();
      await withAdmin((c) => c.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`));
    },
  };
}
