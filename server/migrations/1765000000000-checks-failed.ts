import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * A run counts its checks that failed (`checks_failed`: shards whose outcome is `fail`), so every
 * verdict sees a check that failed on a property law or a monodromy check with every point passed.
 * Judged by its points alone, such a run read "all checked points passed" in green on every screen
 * (the demo's log-principal-sz × complex.js@2.3.0: 154 points passed, exp(log z) = z failed at a
 * subnormal z). The shard executor adds to it as each shard is stored; runs stored before are
 * counted here from their shards.
 */
export class ChecksFailed1765000000000 implements MigrationInterface {
  name = 'ChecksFailed1765000000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE runs ADD COLUMN checks_failed integer NOT NULL DEFAULT 0`);
    await q.query(
      `UPDATE runs r SET checks_failed = s.failed
         FROM (SELECT run_id, count(*)::int AS failed FROM shards WHERE outcome = 'fail' GROUP BY run_id) s
        WHERE s.run_id = r.id`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE runs DROP COLUMN checks_failed`);
  }
}
