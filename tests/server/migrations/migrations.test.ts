import { MIGRATIONS } from '../../../server/data-source';
import { createTestDatabase, type TestDatabase } from '../../setup/test-database';

const tables = async (db: TestDatabase): Promise<string[]> =>
  (await db.dataSource.query(`SELECT tablename FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename`)).map(
    (r: { tablename: string }) => r.tablename,
  );

describe('migrations', () => {
  let db: TestDatabase;
  beforeAll(async () => {
    db = await createTestDatabase({ empty: true });
  });
  afterAll(() => db.drop());

  it('creates the tables going up, removes them all going down, and go up again', async () => {
    const applied = await db.dataSource.runMigrations({ transaction: 'each' });
    expect(applied).toHaveLength(MIGRATIONS.length);
    expect(await tables(db)).toEqual(expect.arrayContaining(['migrations', 'sessions', 'sign_in_limits', 'users']));
    for (let i = 0; i < MIGRATIONS.length; i += 1) await db.dataSource.undoLastMigration({ transaction: 'each' });
    expect(await tables(db)).toEqual(['migrations']);
    expect(await db.dataSource.runMigrations({ transaction: 'each' })).toHaveLength(MIGRATIONS.length);
  });

  it('declares an explicit type on every column of every entity', () => {
    for (const entity of db.dataSource.entityMetadatas) {
      for (const column of entity.columns)
        expect({
          column: `${entity.tableName}.${column.databaseName}`,
          typed: typeof column.type === 'string',
        }).toEqual({ column: `${entity.tableName}.${column.databaseName}`, typed: true });
    }
  });

  it('matches the entities exactly, so nothing is left for synchronize to do', async () => {
    const sql = await db.dataSource.driver.createSchemaBuilder().log();
    expect(sql.upQueries.map((q) => q.query)).toEqual([]);
  });
});
