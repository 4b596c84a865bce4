import { QueryFailedError } from 'typeorm';
import { describeError } from '../../../server/database/describe-error';
import { createTestDatabase, type TestDatabase } from '../../setup/test-database';

const SECRET = 'skt_secretsecretsecretsecret0123';

let db: TestDatabase;
beforeAll(async () => {
  db = await createTestDatabase({ empty: true });
});
afterAll(async () => {
  await db.drop();
});

async function failure(sql: string, parameters: unknown[]): Promise<unknown> {
  const quiet = jest.spyOn(console, 'error').mockImplementation(() => {});
  try {
    await db.dataSource.query(sql, parameters);
  } catch (err) {
    return err;
  } finally {
    quiet.mockRestore();
  }
  throw new Error(`expected ${sql} to fail`);
}

test('a failed query is described by its message, SQLSTATE, constraint and SQL, without parameters or detail', async () => {
  await db.dataSource.query('CREATE TABLE secrets (value text CONSTRAINT secrets_value_unique UNIQUE)');
  await db.dataSource.query('INSERT INTO secrets VALUES ($1)', [SECRET]);
  const err = await failure('INSERT INTO secrets VALUES ($1)', [SECRET]);
  expect(err).toBeInstanceOf(QueryFailedError);
  // What util.inspect (console.error(err)) printed before: the values twice over.
  expect(JSON.stringify((err as QueryFailedError).parameters)).toContain(SECRET);
  const line = describeError(err);
  expect(line).toContain('code 23505');
  expect(line).toContain('constraint secrets_value_unique');
  expect(line).toContain('query: INSERT INTO secrets VALUES ($1)');
  expect(line).toContain('1 parameter(s), values not logged');
  expect(line).not.toContain(SECRET);
});

test('a bad value that PostgreSQL quotes at the end of its message is left out', async () => {
  const line = describeError(await failure('SELECT $1::uuid', [SECRET]));
  expect(line).toContain('invalid input syntax for type uuid: "…"');
  expect(line).not.toContain(SECRET);
});

test('a string or a non-error is described without its content', () => {
  expect(describeError(`invalid input syntax for type uuid: "${SECRET}"`)).not.toContain(SECRET);
  expect(describeError({ password: SECRET })).toBe('non-error thrown: object');
});
