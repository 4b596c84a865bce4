import { Client } from 'pg';
import { pgBaseUrl } from '../../setup/pg-base-url';
import { createTestDatabase, type TestDatabase } from '../../setup/test-database';

/** What the application's connection (the same URL as the server's, from .data/pg-url) may do. */
let db: TestDatabase;
beforeAll(async () => {
  db = await createTestDatabase();
});
afterAll(async () => {
  await db.drop();
});

async function refusal(sql: string): Promise<string | undefined> {
  const quiet = jest.spyOn(console, 'error').mockImplementation(() => {});
  try {
    await db.dataSource.query(sql);
    return undefined;
  } catch (err) {
    return (err as { code?: string }).code;
  } finally {
    quiet.mockRestore();
  }
}

test('the application connects as a role with no superuser, role, database, replication or RLS-bypass rights', async () => {
  const [role] = await db.dataSource.query(
    `SELECT rolname, rolsuper, rolcreaterole, rolcreatedb, rolreplication, rolbypassrls
       FROM pg_roles WHERE rolname = current_user`,
  );
  expect(role).toEqual({
    rolname: expect.not.stringMatching(/^(postgres|sheetkeeper)$/),
    rolsuper: false,
    rolcreaterole: false,
    rolcreatedb: false,
    rolreplication: false,
    rolbypassrls: false,
  });
});

test('the application cannot run programs, read server files, create databases or roles', async () => {
  expect(await refusal(`COPY (SELECT 1) TO PROGRAM 'true'`)).toBe('42501');
  expect(await refusal(`SELECT pg_read_file('PG_VERSION')`)).toBe('42501');
  expect(await refusal('CREATE DATABASE sheetkeeper_not_allowed')).toBe('42501');
  expect(await refusal('CREATE ROLE sheetkeeper_not_allowed')).toBe('42501');
});

test('the application owns its database, so migrations and pg-boss can create schemas and tables in it', async () => {
  const [{ owner }] = await db.dataSource.query(
    `SELECT pg_get_userbyid(datdba) = current_user AS owner FROM pg_database WHERE datname = current_database()`,
  );
  expect(owner).toBe(true);
  await db.dataSource.query('CREATE SCHEMA probe; CREATE TABLE probe.t (x int); DROP SCHEMA probe CASCADE');
});

test('the application cannot connect to the administrative database', async () => {
  const client = new Client({ connectionString: `${pgBaseUrl()}/postgres` });
  await expect(client.connect()).rejects.toMatchObject({ code: '42501' });
  await client.end().catch(() => undefined);
});
