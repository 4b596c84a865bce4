import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Indexes for the failure table's usual pages, measured with 1,000,000 failing points in one
 * run: sorting by ulps took 325 ms alone and made p95 under 50 clients 4.3 s; each filter now
 * reads its page from an index in key order.
 */
export class FailureTableIndexes1764780000000 implements MigrationInterface {
  name = 'FailureTableIndexes1764780000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX failures_run_diagnosis_idx`);
    await q.query(`CREATE INDEX failures_run_diagnosis_idx ON failures (run_id, diagnosis_kind, id)`);
    await q.query(`CREATE INDEX failures_run_suite_idx ON failures (run_id, suite_slug, id)`);
    await q.query(`CREATE INDEX failures_run_ulps_idx ON failures (run_id, (coalesce(ulps, 0)) DESC, id)`);
    await q.query(
      `CREATE INDEX failures_run_diagnosis_ulps_idx ON failures (run_id, diagnosis_kind, (coalesce(ulps, 0)) DESC, id)`,
    );
    await q.query(`CREATE INDEX failures_run_new_idx ON failures (run_id, id) WHERE is_regression`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX failures_run_new_idx`);
    await q.query(`DROP INDEX failures_run_diagnosis_ulps_idx`);
    await q.query(`DROP INDEX failures_run_ulps_idx`);
    await q.query(`DROP INDEX failures_run_suite_idx`);
    await q.query(`DROP INDEX failures_run_diagnosis_idx`);
    await q.query(`CREATE INDEX failures_run_diagnosis_idx ON failures (run_id, diagnosis_kind)`);
  }
}
