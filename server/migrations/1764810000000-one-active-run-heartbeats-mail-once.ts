import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Issue 11's queue and mail half, enforced by the database rather than by application code:
 * - one queued or running run per plan (`runs_one_active_per_plan`), so two "Run now" at the
 *   same moment cannot make two runs; runs that already broke this are cancelled, newest kept;
 * - when a worker took a shard (`shards.claimed_at`), so a dead worker's shard is found in seconds;
 * - a mail's idempotency key (unique), and the states `sending`, `unconfirmed` and `failed`, so a
 *   mail is sent at most once and one that cannot be sent says why.
 */
export class OneActiveRunHeartbeatsMailOnce1764810000000 implements MigrationInterface {
  name = 'OneActiveRunHeartbeatsMailOnce1764810000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(
      `UPDATE runs SET status = 'cancelled', finished_at = now()
        WHERE status IN ('queued', 'running') AND plan_id IS NOT NULL
          AND id NOT IN (SELECT DISTINCT ON (plan_id) id FROM runs WHERE status IN ('queued', 'running') AND plan_id IS NOT NULL
                          ORDER BY plan_id, created_at DESC, id DESC)`,
    );
    await q.query(
      `CREATE UNIQUE INDEX "runs_one_active_per_plan" ON "runs" ("plan_id") WHERE status IN ('queued', 'running')`,
    );
    await q.query(`ALTER TABLE "shards" ADD "claimed_at" timestamptz`);
    await q.query(`ALTER TABLE "outbox_mail" ADD "idempotency_key" text`);
    await q.query(
      `ALTER TABLE "outbox_mail" ADD CONSTRAINT "outbox_mail_idempotency_key_unique" UNIQUE ("idempotency_key")`,
    );
    await q.query(`ALTER TABLE "outbox_mail" ADD "claimed_at" timestamptz`);
    await q.query(`ALTER TABLE "outbox_mail" DROP CONSTRAINT "outbox_mail_status_known"`);
    await q.query(
      `ALTER TABLE "outbox_mail" ADD CONSTRAINT "outbox_mail_status_known" CHECK (status IN ('pending', 'sending', 'sent', 'unconfirmed', 'failed'))`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE "outbox_mail" DROP CONSTRAINT "outbox_mail_status_known"`);
    await q.query(`UPDATE "outbox_mail" SET status = 'pending' WHERE status IN ('sending', 'unconfirmed', 'failed')`);
    await q.query(
      `ALTER TABLE "outbox_mail" ADD CONSTRAINT "outbox_mail_status_known" CHECK (status IN ('pending', 'sent'))`,
    );
    await q.query(`ALTER TABLE "outbox_mail" DROP COLUMN "claimed_at"`);
    await q.query(`ALTER TABLE "outbox_mail" DROP CONSTRAINT "outbox_mail_idempotency_key_unique"`);
    await q.query(`ALTER TABLE "outbox_mail" DROP COLUMN "idempotency_key"`);
    await q.query(`ALTER TABLE "shards" DROP COLUMN "claimed_at"`);
    await q.query(`DROP INDEX "runs_one_active_per_plan"`);
  }
}
