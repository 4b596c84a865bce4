import { compareVersions } from '../../../harness/adapters/compare-versions';
import { versionOrderSql } from '../../../server/sql/version-order-sql';
import { createTestDatabase, type TestDatabase } from '../../setup/test-database';

/** Versions as targets name them, prereleases and short forms included. */
const VERSIONS = [
  '2.4.3',
  '2.4.1',
  '2.10.0',
  '2.9.1',
  '2.5',
  '2.5.0',
  '2.5.0-1',
  '15.2.0',
  '0.0.1',
  '3.0.0-beta.2',
  '1',
];

describe('versionOrderSql', () => {
  let db: TestDatabase;
  beforeAll(async () => {
    db = await createTestDatabase();
  });
  afterAll(() => db.drop());

  it("orders every pair of versions as the harness's compareVersions does", async () => {
    const pairs = VERSIONS.flatMap((a) => VERSIONS.map((b) => [a, b] as const));
    const rows: { a: string; b: string; sign: number }[] = await db.dataSource.query(
      `SELECT v.a, v.b, CASE WHEN ${versionOrderSql('v.a')} < ${versionOrderSql('v.b')} THEN -1
                             WHEN ${versionOrderSql('v.a')} > ${versionOrderSql('v.b')} THEN 1 ELSE 0 END AS sign
         FROM unnest($1::text[], $2::text[]) AS v(a, b)`,
      [pairs.map((p) => p[0]), pairs.map((p) => p[1])],
    );
    expect(rows.map((r) => `${r.a} ? ${r.b}: ${r.sign}`)).toEqual(
      pairs.map(([a, b]) => `${a} ? ${b}: ${Math.sign(compareVersions(a, b))}`),
    );
  });
});
