import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Issue 15, the admin's day: users can be deactivated (`users.deactivated_at`), and one-time
 * links (invitations and password resets) are stored as token hashes in `account_links`. The
 * expression index on the sessions' user id lets a deactivation or a reset end that user's
 * sessions without reading every session row.
 */
export class AccountLinksAndDeactivation1764940000000 implements MigrationInterface {
  name = 'AccountLinksAndDeactivation1764940000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE users ADD COLUMN deactivated_at timestamptz`);
    await q.query(`
      CREATE TABLE account_links (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        kind text NOT NULL,
        token_hash text NOT NULL,
        email text NOT NULL,
        role text NOT NULL,
        user_id uuid,
        created_by_id uuid NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        expires_at timestamptz NOT NULL,
        used_at timestamptz,
        replaced_at timestamptz,
        CONSTRAINT account_links_kind_known CHECK (kind IN ('invitation', 'password-reset')),
        CONSTRAINT account_links_email_lower CHECK (email = lower(email)),
        CONSTRAINT account_links_role_known CHECK (role IN ('admin', 'maintainer', 'reviewer', 'contributor')),
        CONSTRAINT "FK_account_links_user" FOREIGN KEY (user_id) REFERENCES users(id) ON DELETE CASCADE,
        CONSTRAINT "FK_account_links_created_by" FOREIGN KEY (created_by_id) REFERENCES users(id) ON DELETE CASCADE
      )`);
    await q.query(`CREATE UNIQUE INDEX account_links_hash_unique ON account_links (token_hash)`);
    await q.query(`CREATE INDEX account_links_email_idx ON account_links (email)`);
    await q.query(`CREATE INDEX sessions_user_idx ON sessions ((sess #>> '{passport,user}'))`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX sessions_user_idx`);
    await q.query(`DROP TABLE account_links`);
    await q.query(`ALTER TABLE users DROP COLUMN deactivated_at`);
  }
}
