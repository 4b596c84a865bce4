import type { MigrationInterface, QueryRunner } from 'typeorm';

const RANK = `(CASE finding_class WHEN 'branch' THEN 0 WHEN 'accuracy' THEN 1 ELSE 2 END)`;

/**
 * Two changes for the Overview and the failure table (issue 15):
 *
 * - The failure table lists the newest failures first within each class. The two rank indexes
 *   end in `-id` instead of `id`, so a page in (rank, newest first) order is one index range
 *   and the next page's row comparison `(rank, -id) > (…)` starts where the last one ended
 *   (an index on `id DESC` cannot serve a row comparison that mixes directions).
 * - A completed run with no completed run of its plan before it compared with nothing: its
 *   regressions are null (markRegressions writes null now), not 0, so screens can say "first
 *   run of this plan to complete". Runs stored before are set the same way.
 */
export class NewestFailuresFirstAndFirstRuns1764960000000 implements MigrationInterface {
  name = 'NewestFailuresFirstAndFirstRuns1764960000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX failures_run_rank_idx`);
    await q.query(`DROP INDEX failures_run_kind_rank_idx`);
    await q.query(`CREATE INDEX failures_run_rank_idx ON failures (run_id, ${RANK}, (-id))`);
    await q.query(`CREATE INDEX failures_run_kind_rank_idx ON failures (run_id, diagnosis_kind, ${RANK}, (-id))`);
    await q.query(
      `UPDATE runs r SET regressions = NULL
        WHERE r.status = 'completed' AND r.regressions = 0
          AND NOT EXISTS (SELECT 1 FROM runs p WHERE p.plan_id = r.plan_id AND p.status = 'completed' AND p.created_at < r.created_at)`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`UPDATE runs SET regressions = 0 WHERE status = 'completed' AND regressions IS NULL`);
    await q.query(`DROP INDEX failures_run_kind_rank_idx`);
    await q.query(`DROP INDEX failures_run_rank_idx`);
    await q.query(`CREATE INDEX failures_run_rank_idx ON failures (run_id, ${RANK}, id)`);
    await q.query(`CREATE INDEX failures_run_kind_rank_idx ON failures (run_id, diagnosis_kind, ${RANK}, id)`);
  }
}
