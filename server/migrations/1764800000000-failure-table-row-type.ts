import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * A composite type whose attribute names are the failure table's JSON keys, so PostgreSQL writes
 * a page row with `json_agg(ROW(...)::failure_table_row)` instead of `json_build_object` with
 * nineteen key–value pairs, which looks up each argument's type on every row. Measured with
 * pgbench (one client, 50-row pages over 1,000,000 failing points): 1.17 ms → 0.76 ms a page.
 */
export class FailureTableRowType1764800000000 implements MigrationInterface {
  name = 'FailureTableRowType1764800000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(
      `CREATE TYPE failure_table_row AS (
        "id" text, "runId" uuid, "suiteSlug" text, "suiteVersion" integer, "targetName" text, "convention" text,
        "pathName" text, "pointIndex" integer, "t" double precision, "label" text, "z" jsonb, "zHex" jsonb,
        "expected" jsonb, "actual" jsonb, "outcomeKind" text, "diagnosis" jsonb, "ulps" double precision,
        "relativeError" double precision, "isRegression" boolean)`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TYPE failure_table_row`);
  }
}
