import { FAILURE_ROW } from '../../../server/sql/failure-search-sql';
import { FAILURE_ROW_FIELDS } from '../../../shared/failure-row-fields';
import { createTestDatabase, type TestDatabase } from '../../setup/test-database';

/** "name type null|not null", as the list and the catalogue both say it. */
const described = (name: string, type: string, nullable: boolean) =>
  `${name} ${type} ${nullable ? 'null' : 'not null'}`;

describe('FAILURE_ROW_FIELDS against the migrations', () => {
  let db: TestDatabase;
  beforeAll(async () => {
    db = await createTestDatabase();
  });
  afterAll(() => db.drop());

  it('names every column of the table failures with its type and nullability, and nothing else', async () => {
    const columns: { column_name: string; data_type: string; is_nullable: 'YES' | 'NO' }[] = await db.dataSource.query(
      `SELECT column_name, data_type, is_nullable FROM information_schema.columns
        WHERE table_schema = 'public' AND table_name = 'failures'`,
    );
    // Compared as sets: the SQL reads the table's columns by name, never by position.
    const inDatabase = columns.map((c) => described(c.column_name, c.data_type, c.is_nullable === 'YES')).sort();
    const inList = FAILURE_ROW_FIELDS.map((f) =>
      described(f.column, f.columnType, 'nullable' in f && f.nullable),
    ).sort();
    expect(inList).toEqual(inDatabase);
  });

  it('gives the attributes of the composite type failure_table_row in order: the row fields, with their types', async () => {
    const attributes: { attname: string; type: string }[] = await db.dataSource.query(
      `SELECT a.attname, format_type(a.atttypid, a.atttypmod) AS type
         FROM pg_attribute a JOIN pg_type t ON t.typrelid = a.attrelid
        WHERE t.typname = 'failure_table_row' AND a.attnum > 0 AND NOT a.attisdropped
        ORDER BY a.attnum`,
    );
    // In order: ROW(...)::failure_table_row fills the attributes by position.
    const inList = FAILURE_ROW_FIELDS.filter((f) => f.shown === 'row').map(
      (f) => `${f.key} ${'rowType' in f ? f.rowType : f.columnType}`,
    );
    expect(inList).toEqual(attributes.map((a) => `${a.attname} ${a.type}`));
  });

  it('reads a page row with the list and gets the keys of the list in order', async () => {
    const [row] = await db.dataSource.query(
      `SELECT row_to_json(${FAILURE_ROW})::text AS json
         FROM (VALUES (1::bigint, gen_random_uuid(), 's', 1, 't', 'c', 'p', 0, 0.5::float8, NULL::text,
                       '{}'::jsonb, '{}'::jsonb, NULL::jsonb, NULL::jsonb, 'fail', NULL::jsonb,
                       'Infinity'::float8, 'NaN'::float8, true, '[]'::jsonb, 'branch'))
           AS v(id, run_id, suite_slug, suite_version, target_name, convention, path_name, point_index, t, label,
                z, z_hex, expected, actual, outcome_kind, diagnosis, ulps, relative_error, is_regression, labels,
                finding_class)`,
    );
    const parsed = JSON.parse(row.json) as Record<string, unknown>;
    expect(Object.keys(parsed)).toEqual(FAILURE_ROW_FIELDS.filter((f) => f.shown === 'row').map((f) => f.key));
    // JSON cannot write ±inf or NaN: those become null.
    expect(parsed).toMatchObject({ id: '1', ulps: null, relativeError: null, isRegression: true });
  });
});
