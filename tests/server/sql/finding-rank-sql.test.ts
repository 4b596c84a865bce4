import { failureSearchSql } from '../../../server/sql/failure-search-sql';
import { createTestDatabase, type TestDatabase } from '../../setup/test-database';

/** The plan's text for one page query, with sequential scans priced out so only a usable index can win. */
async function planOf(db: TestDatabase, q: Parameters<typeof failureSearchSql>[0], bitmaps = false): Promise<string> {
  const { from, order, params } = failureSearchSql(q);
  return db.dataSource.transaction(async (tx) => {
    await tx.query('SET LOCAL enable_seqscan = off');
    if (!bitmaps) await tx.query('SET LOCAL enable_bitmapscan = off');
    const rows: { 'QUERY PLAN': string }[] = await tx.query(
      `EXPLAIN SELECT f.id FROM ${from} ORDER BY ${order} LIMIT $${params.length}`,
      params,
    );
    return rows.map((r) => r['QUERY PLAN']).join('\n');
  });
}

describe('findingRankSql and the rank indexes', () => {
  let db: TestDatabase;
  beforeAll(async () => {
    db = await createTestDatabase();
  });
  afterAll(() => db.drop());

  const run = '11111111-1111-4111-8111-111111111111';

  it('is the expression the rank indexes are built on, so a page in class order reads one index without sorting', async () => {
    const byId = await planOf(db, { run, sort: 'id', limit: 50 });
    expect(byId).toMatch(/Index (Only )?Scan using failures_run_rank_idx/);
    expect(byId).not.toMatch(/Sort/);
    const byUlps = await planOf(db, { run, sort: 'ulps', limit: 50 });
    expect(byUlps).toMatch(/Index (Only )?Scan using failures_run_rank_ulps_idx/);
    expect(byUlps).not.toMatch(/Sort/);
    // The next page, newest first, starts inside the index: the cursor is an index condition, not a filter.
    const next = await planOf(db, { run, sort: 'id', limit: 50, after: '30:0' });
    expect(next).toMatch(/Index (Only )?Scan using failures_run_rank_idx/);
    expect(next).toMatch(/Index Cond: .*ROW\(/);
    expect(next).not.toMatch(/Sort/);
    const branch = await planOf(db, { run, class: 'branch', sort: 'id', limit: 50 });
    expect(branch).toMatch(/failures_run_rank_idx/);
  });

  it('reads the points a label filter leads from the leading-kind index, in page order', async () => {
    const byUlps = await planOf(db, { run, diagnosis: 'inaccurate', sort: 'ulps', limit: 50 }, true);
    expect(byUlps).toMatch(/Index (Only )?Scan using failures_run_kind_rank_ulps_idx/);
    const byId = await planOf(db, { run, diagnosis: 'zero-sign', sort: 'id', limit: 50 }, true);
    expect(byId).toMatch(/Index (Only )?Scan using failures_run_kind_rank_idx/);
  });
});
