import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Users with their role, the session store of connect-pg-simple (its documented
 * table), and the table rate-limiter-flexible keeps sign-in attempts in.
 */
export class UsersSessionsSignInLimits1764626400000 implements MigrationInterface {
  name = 'UsersSessionsSignInLimits1764626400000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE users (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        email text NOT NULL,
        display_name text NOT NULL,
        password_hash text NOT NULL,
        role text NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT users_email_unique UNIQUE (email),
        CONSTRAINT users_email_lower CHECK (email = lower(email)),
        CONSTRAINT users_role_known CHECK (role IN ('admin', 'maintainer', 'reviewer', 'contributor'))
      )`);
    await q.query(`
      CREATE TABLE sessions (
        sid varchar NOT NULL COLLATE "default" PRIMARY KEY,
        sess json NOT NULL,
        expire timestamp(6) NOT NULL
      )`);
    await q.query(`CREATE INDEX sessions_expire_idx ON sessions (expire)`);
    await q.query(`
      CREATE TABLE sign_in_limits (
        key varchar(255) PRIMARY KEY,
        points integer NOT NULL DEFAULT 0,
        expire bigint
      )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE sign_in_limits`);
    await q.query(`DROP TABLE sessions`);
    await q.query(`DROP TABLE users`);
  }
}
