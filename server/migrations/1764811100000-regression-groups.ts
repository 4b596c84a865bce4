import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Regressions counted per run, target key, suite, path and diagnosis (entities/regression-group.ts),
 * filled here for the runs already stored; markRegressions writes them for each new run. The
 * SQL is written out, not imported, so this migration means the same thing when the code moves on.
 */
export class RegressionGroups1764811100000 implements MigrationInterface {
  name = 'RegressionGroups1764811100000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE regression_groups (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        run_id uuid NOT NULL,
        target_key text NOT NULL,
        suite_slug text NOT NULL,
        path_name text NOT NULL,
        diagnosis_kind text,
        count integer NOT NULL,
        CONSTRAINT "FK_regression_groups_run" FOREIGN KEY (run_id) REFERENCES runs(id) ON DELETE CASCADE
      )`);
    await q.query(`CREATE INDEX regression_groups_run_idx ON regression_groups (run_id, target_key)`);
    await q.query(`
      INSERT INTO regression_groups (run_id, target_key, suite_slug, path_name, diagnosis_kind, count)
      SELECT run_id, regexp_replace(target_name, '@[^/]+', ''), suite_slug, path_name, diagnosis_kind, count(*)::int
        FROM failures WHERE is_regression
       GROUP BY run_id, 2, suite_slug, path_name, diagnosis_kind`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE regression_groups`);
  }
}
