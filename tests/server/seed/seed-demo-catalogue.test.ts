import { readdirSync } from 'node:fs';
import path from 'node:path';
import { seedDemoCatalogue } from '../../../server/seed/seed-demo-catalogue';
import { createTestDatabase, type TestDatabase } from '../../setup/test-database';

const DEMO_FILES = readdirSync(path.join(__dirname, '..', '..', '..', 'suites', 'demo')).filter((f) =>
  f.endsWith('.json'),
).length;

describe('seedDemoCatalogue', () => {
  let db: TestDatabase;
  beforeAll(async () => {
    db = await createTestDatabase();
  });
  afterAll(() => db.drop());

  it('adds every demo suite as an approved version and the three demo plans with schedules, then nothing the second time', async () => {
    expect(await seedDemoCatalogue(db.dataSource)).toEqual({ suites: DEMO_FILES, plans: 3 });
    const [counts] = await db.dataSource.query(
      `SELECT (SELECT count(*) FROM suite_versions WHERE status = 'approved')::int AS approved,
              (SELECT count(*) FROM schedules WHERE enabled)::int AS schedules,
              (SELECT count(*) FROM plan_targets)::int AS targets`,
    );
    expect(counts).toMatchObject({ approved: DEMO_FILES, schedules: 3 });
    expect(counts.targets).toBeGreaterThanOrEqual(4);
    expect(await seedDemoCatalogue(db.dataSource)).toEqual({ suites: 0, plans: 0 });
  }, 60_000);
});
