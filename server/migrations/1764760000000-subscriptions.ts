import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Who wants regression mail about which library. */
export class Subscriptions1764760000000 implements MigrationInterface {
  name = 'Subscriptions1764760000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE subscriptions (
        user_id uuid NOT NULL,
        target_key text NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        PRIMARY KEY (user_id, target_key),
        CONSTRAINT "FK_subscriptions_user" FOREIGN KEY (user_id) REFERENCES users(id) ON DELETE CASCADE
      )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE subscriptions`);
  }
}
