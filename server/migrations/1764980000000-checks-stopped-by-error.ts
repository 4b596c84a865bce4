import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * A run counts its checks stopped by an error (`checks_stopped`), so every list judges a run as
 * its run page does without reading its shards: a run whose library lacks a function (every point
 * of that check skipped) read "all checked points passed" on the runs list and the Overview and
 * "completed with errors" on its own page. The shard executor adds to it as each shard is stored;
 * runs stored before are counted here from their shards by the rule of
 * shared/check-stopped-by-error.ts as it stands today (an error outcome, or a done shard that
 * passed and failed no point), written in SQL because a migration must not change with the code.
 */
export class ChecksStoppedByError1764980000000 implements MigrationInterface {
  name = 'ChecksStoppedByError1764980000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE runs ADD COLUMN checks_stopped integer NOT NULL DEFAULT 0`);
    await q.query(
      `UPDATE runs r SET checks_stopped = s.stopped
         FROM (SELECT run_id, count(*)::int AS stopped FROM shards
                WHERE outcome = 'error'
                   OR (status = 'done'
                       AND coalesce((counts->>'pass')::int, 0) + coalesce((counts->>'fail')::int, 0) = 0)
                GROUP BY run_id) s
        WHERE s.run_id = r.id`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE runs DROP COLUMN checks_stopped`);
  }
}
