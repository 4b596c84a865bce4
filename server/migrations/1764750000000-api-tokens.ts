import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Personal API tokens for CI, stored as hashes. */
export class ApiTokens1764750000000 implements MigrationInterface {
  name = 'ApiTokens1764750000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE api_tokens (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        user_id uuid NOT NULL,
        name text NOT NULL,
        token_hash text NOT NULL,
        prefix text NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        last_used_at timestamptz,
        revoked_at timestamptz,
        CONSTRAINT "FK_api_tokens_user" FOREIGN KEY (user_id) REFERENCES users(id) ON DELETE CASCADE
      )`);
    await q.query(`CREATE UNIQUE INDEX api_tokens_hash_unique ON api_tokens (token_hash)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE api_tokens`);
  }
}
