import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Reviewers' verdicts on failures, and the accepted deviations that keep failures out of regressions. */
export class Deviations1764740000000 implements MigrationInterface {
  name = 'Deviations1764740000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE deviations (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        classification text NOT NULL,
        scope text NOT NULL,
        target_key text NOT NULL,
        suite_slug text NOT NULL,
        path_name text,
        point_key text,
        diagnosis_kind text,
        reason text NOT NULL,
        expires_at timestamptz,
        failure_id bigint,
        created_by uuid NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        revoked_at timestamptz,
        CONSTRAINT deviations_classification_known CHECK (classification IN ('bug', 'convention-difference', 'accepted')),
        CONSTRAINT deviations_scope_known CHECK (scope IN ('point', 'path', 'suite', 'diagnosis')),
        CONSTRAINT "FK_deviations_created_by" FOREIGN KEY (created_by) REFERENCES users(id) ON DELETE RESTRICT
      )`);
    await q.query(`CREATE INDEX deviations_match_idx ON deviations (target_key, suite_slug)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE deviations`);
  }
}
