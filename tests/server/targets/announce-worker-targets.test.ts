import { announceWorkerTargets } from '../../../server/targets/announce-worker-targets';
import { createTestDatabase, type TestDatabase } from '../../setup/test-database';

describe('announceWorkerTargets', () => {
  let db: TestDatabase;

  beforeAll(async () => {
    db = await createTestDatabase();
  });
  afterAll(() => db.drop());

  beforeEach(() => db.dataSource.query(`DELETE FROM targets`));

  it('records the targets it announces as installed, so a library only a worker has can be named by plans', async () => {
    const names = await announceWorkerTargets(db.dataSource, ['complex.js@2.3.0']);
    expect(names).toEqual(['complex.js@2.3.0']);
    const rows = await db.dataSource.query(`SELECT name, library, version, installed FROM targets ORDER BY name`);
    expect(rows).toEqual([{ name: 'complex.js@2.3.0', library: 'complex.js', version: '2.3.0', installed: true }]);
  });

  it('announces nothing and records nothing when the narrowing names no target it has', async () => {
    expect(await announceWorkerTargets(db.dataSource, ['no-such-library@'])).toEqual([]);
    expect(await db.dataSource.query(`SELECT name FROM targets`)).toEqual([]);
  });
});
