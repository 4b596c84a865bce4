import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Issue 13: a stored failure keeps every label of its point (`labels`, the leading one first),
 * its class (`finding_class`: branch or accuracy, null for an error or a skipped point), a
 * composed subject's steps with the first step that left the reference, and the rule of a
 * convention choice. Rows stored before read as one label (their diagnosis) and get the class
 * of that label. Runs and shards count failures by class (`by_class`), counted again from the
 * stored failures for runs and shards already done; every counts object gains `notApplicable`
 * (0 for what was stored before, when no point could be not applicable).
 *
 * Pages list branch findings first: the old (run, ulps) index gives way to (run, class rank,
 * ulps) and a (run, class rank, id) one, the rank being the expression `findingRankSql` writes
 * (server/sql/finding-rank-sql.ts; the planner uses an expression index only for the same
 * expression), and the same two after the leading kind, for a label filter's points whose leading
 * label it is. Its points that carry it further down are found through a GIN index on the labels
 * after the first (`labels - 0`), which holds only those (failure-search-sql.ts says why).
 */
export class FailureLabelsAndClasses1764900000000 implements MigrationInterface {
  name = 'FailureLabelsAndClasses1764900000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(
      `ALTER TABLE failures
         ADD COLUMN labels jsonb NOT NULL DEFAULT '[]',
         ADD COLUMN finding_class text,
         ADD COLUMN steps jsonb,
         ADD COLUMN first_left_step integer,
         ADD COLUMN choice text`,
    );
    await q.query(
      `UPDATE failures SET labels = jsonb_build_array(diagnosis),
              finding_class = CASE WHEN diagnosis_kind = 'inaccurate' THEN 'accuracy' ELSE 'branch' END
        WHERE diagnosis IS NOT NULL`,
    );
    await q.query(`DROP INDEX failures_run_ulps_idx`);
    await q.query(`DROP INDEX failures_run_diagnosis_ulps_idx`);
    await q.query(
      `CREATE INDEX failures_run_rank_idx ON failures
         (run_id, (CASE finding_class WHEN 'branch' THEN 0 WHEN 'accuracy' THEN 1 ELSE 2 END), id)`,
    );
    await q.query(
      `CREATE INDEX failures_run_rank_ulps_idx ON failures
         (run_id, (CASE finding_class WHEN 'branch' THEN 0 WHEN 'accuracy' THEN 1 ELSE 2 END), (coalesce(ulps, 0)) DESC, id)`,
    );
    await q.query(
      `CREATE INDEX failures_run_kind_rank_idx ON failures
         (run_id, diagnosis_kind, (CASE finding_class WHEN 'branch' THEN 0 WHEN 'accuracy' THEN 1 ELSE 2 END), id)`,
    );
    await q.query(
      `CREATE INDEX failures_run_kind_rank_ulps_idx ON failures
         (run_id, diagnosis_kind, (CASE finding_class WHEN 'branch' THEN 0 WHEN 'accuracy' THEN 1 ELSE 2 END), (coalesce(ulps, 0)) DESC, id)`,
    );
    await q.query(`CREATE INDEX failures_later_labels_idx ON failures USING gin ((labels - 0) jsonb_path_ops)`);
    await q.query(`ALTER TYPE failure_table_row ADD ATTRIBUTE "labels" jsonb, ADD ATTRIBUTE "findingClass" text`);

    for (const table of ['runs', 'shards', 'path_summaries'])
      await q.query(
        `UPDATE ${table} SET counts = counts || '{"notApplicable": 0}' WHERE counts IS NOT NULL AND NOT counts ? 'notApplicable'`,
      );
    await q.query(`ALTER TABLE runs ADD COLUMN by_class jsonb NOT NULL DEFAULT '{"branch": 0, "accuracy": 0}'`);
    await q.query(`ALTER TABLE shards ADD COLUMN by_class jsonb`);
    await q.query(
      `UPDATE shards s SET by_class = jsonb_build_object(
              'branch', (SELECT count(*) FROM failures f WHERE f.shard_id = s.id AND f.finding_class = 'branch'),
              'accuracy', (SELECT count(*) FROM failures f WHERE f.shard_id = s.id AND f.finding_class = 'accuracy'))
        WHERE s.counts IS NOT NULL`,
    );
    await q.query(
      `UPDATE runs r SET by_class = jsonb_build_object(
              'branch', (SELECT count(*) FROM failures f WHERE f.run_id = r.id AND f.finding_class = 'branch'),
              'accuracy', (SELECT count(*) FROM failures f WHERE f.run_id = r.id AND f.finding_class = 'accuracy'))`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE shards DROP COLUMN by_class`);
    await q.query(`ALTER TABLE runs DROP COLUMN by_class`);
    for (const table of ['runs', 'shards', 'path_summaries'])
      await q.query(`UPDATE ${table} SET counts = counts - 'notApplicable' WHERE counts IS NOT NULL`);
    await q.query(`ALTER TYPE failure_table_row DROP ATTRIBUTE "findingClass", DROP ATTRIBUTE "labels"`);
    await q.query(`DROP INDEX failures_later_labels_idx`);
    await q.query(`DROP INDEX failures_run_kind_rank_ulps_idx`);
    await q.query(`DROP INDEX failures_run_kind_rank_idx`);
    await q.query(`DROP INDEX failures_run_rank_ulps_idx`);
    await q.query(`DROP INDEX failures_run_rank_idx`);
    await q.query(`CREATE INDEX failures_run_ulps_idx ON failures (run_id, (coalesce(ulps, 0)) DESC, id)`);
    await q.query(
      `CREATE INDEX failures_run_diagnosis_ulps_idx ON failures (run_id, diagnosis_kind, (coalesce(ulps, 0)) DESC, id)`,
    );
    await q.query(
      `ALTER TABLE failures DROP COLUMN choice, DROP COLUMN first_left_step, DROP COLUMN steps,
         DROP COLUMN finding_class, DROP COLUMN labels`,
    );
  }
}
