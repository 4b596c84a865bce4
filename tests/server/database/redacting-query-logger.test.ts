import { createTestDatabase, type TestDatabase } from '../../setup/test-database';

/** Values that must never reach a log: shaped like what the server sends (a token hash, a password hash). */
const TOKEN_HASH = 'a3f1c0ffee5ecret0token0hash0000000000000000000000000000000000beef';
const PASSWORD_HASH = '$2b$11$secretsecretsecretsecretsecretsecretsecretsecretsecre';

let db: TestDatabase;
beforeAll(async () => {
  db = await createTestDatabase({ empty: true });
});
afterAll(async () => {
  await db.drop();
});

function captureConsole(): { text: () => string; restore: () => void } {
  const lines: string[] = [];
  const spies = (['error', 'warn', 'log', 'info'] as const).map((level) =>
    jest.spyOn(console, level).mockImplementation((...args: unknown[]) => {
      lines.push(args.map(String).join(' '));
    }),
  );
  return { text: () => lines.join('\n'), restore: () => spies.forEach((s) => s.mockRestore()) };
}

test('a failed query is logged with its SQL and the number of its parameters, never their values', async () => {
  const out = captureConsole();
  try {
    await expect(
      db.dataSource.query('SELECT $1::uuid AS token, $2::text AS password', [TOKEN_HASH, PASSWORD_HASH]),
    ).rejects.toThrow();
  } finally {
    out.restore();
  }
  expect(out.text()).toContain('query failed: SELECT $1::uuid AS token, $2::text AS password -- 2 parameter(s)');
  expect(out.text()).toContain('22P02');
  expect(out.text()).not.toContain(TOKEN_HASH);
  expect(out.text()).not.toContain(PASSWORD_HASH);
  expect(out.text()).not.toContain('secret');
});

test('a unique violation is logged without the key value PostgreSQL repeats in its detail', async () => {
  await db.dataSource.query('CREATE TABLE tokens (token_hash text CONSTRAINT tokens_hash_unique UNIQUE)');
  await db.dataSource.query('INSERT INTO tokens VALUES ($1)', [TOKEN_HASH]);
  const out = captureConsole();
  try {
    await expect(db.dataSource.query('INSERT INTO tokens VALUES ($1)', [TOKEN_HASH])).rejects.toThrow();
  } finally {
    out.restore();
  }
  expect(out.text()).toContain('1 parameter(s), values not logged');
  expect(out.text()).toContain('tokens_hash_unique');
  expect(out.text()).not.toContain(TOKEN_HASH);
});
