import { createServer } from 'node:net';
import { Client } from 'pg';
import { isDatabaseUnavailable } from '../../../server/database/is-database-unavailable';
import { databaseOutage } from '../../setup/database-outage';
import { createTestDatabase, type TestDatabase } from '../../setup/test-database';

let db: TestDatabase;
beforeAll(async () => {
  db = await createTestDatabase({ empty: true });
});
afterAll(async () => {
  await db.drop();
});

async function errorOf(work: () => Promise<unknown>): Promise<unknown> {
  const quiet = jest.spyOn(console, 'error').mockImplementation(() => {});
  try {
    await work();
  } catch (err) {
    return err;
  } finally {
    quiet.mockRestore();
  }
  throw new Error('expected the work to fail');
}

/** A loopback port that nothing listens on. */
async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as { port: number };
  await new Promise((resolve) => server.close(resolve));
  return port;
}

test('errors of the query itself are not an outage, so they still answer 500 and are logged as bugs', async () => {
  for (const sql of ['SELEC 1', 'SELECT * FROM no_such_table', 'SELECT 1/0', "SELECT 'x'::uuid"]) {
    expect({ sql, unavailable: isDatabaseUnavailable(await errorOf(() => db.dataSource.query(sql))) }).toEqual({
      sql,
      unavailable: false,
    });
  }
  expect(isDatabaseUnavailable(new Error('something else'))).toBe(false);
  expect(isDatabaseUnavailable(null)).toBe(false);
});

test('a refused connection, a terminated session and a database that refuses connections are an outage', async () => {
  const refused = new Client({ host: '127.0.0.1', port: await closedPort(), connectionTimeoutMillis: 2000 });
  expect(isDatabaseUnavailable(await errorOf(() => refused.connect()))).toBe(true);

  const outage = databaseOutage(db.url);
  try {
    // A query on a terminated connection fails inside TypeORM's QueryFailedError or as pg's own error.
    const held = new Client({ connectionString: db.url });
    await held.connect();
    held.on('error', () => undefined);
    await outage.begin();
    expect(isDatabaseUnavailable(await errorOf(() => held.query('SELECT 1')))).toBe(true);
    await held.end().catch(() => undefined);
    expect(isDatabaseUnavailable(await errorOf(() => db.dataSource.query('SELECT 1')))).toBe(true);
  } finally {
    await outage.end();
  }
});
