import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * An admin can withdraw an invitation before it is used (`account_links.cancelled_at`): the link
 * stops working at once and the join page says it was withdrawn. Only an invitation can be
 * withdrawn; a password reset is voided by a newer reset or a deactivation.
 */
export class InvitationCancelledAt1764990000000 implements MigrationInterface {
  name = 'InvitationCancelledAt1764990000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE account_links ADD COLUMN cancelled_at timestamptz`);
    await q.query(
      `ALTER TABLE account_links ADD CONSTRAINT account_links_cancel_invitation CHECK (cancelled_at IS NULL OR kind = 'invitation')`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE account_links DROP CONSTRAINT account_links_cancel_invitation`);
    await q.query(`ALTER TABLE account_links DROP COLUMN cancelled_at`);
  }
}
