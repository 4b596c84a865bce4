import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Suites and their reviewed versions. */
export class SuitesAndVersions1764700000000 implements MigrationInterface {
  name = 'SuitesAndVersions1764700000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE suites (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        slug text NOT NULL,
        created_by uuid NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT "UQ_suites_slug" UNIQUE (slug),
        CONSTRAINT "FK_suites_created_by" FOREIGN KEY (created_by) REFERENCES users(id) ON DELETE RESTRICT
      )`);
    await q.query(`
      CREATE TABLE suite_versions (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        suite_id uuid NOT NULL,
        version integer NOT NULL,
        status text NOT NULL,
        body jsonb NOT NULL,
        author_id uuid NOT NULL,
        reviewer_id uuid,
        review_comment text,
        created_at timestamptz NOT NULL DEFAULT now(),
        submitted_at timestamptz,
        reviewed_at timestamptz,
        CONSTRAINT suite_versions_status_known CHECK (status IN ('draft', 'submitted', 'approved', 'changes-requested', 'retired')),
        CONSTRAINT suite_versions_version_positive CHECK (version >= 1),
        CONSTRAINT "FK_suite_versions_suite" FOREIGN KEY (suite_id) REFERENCES suites(id) ON DELETE CASCADE,
        CONSTRAINT "FK_suite_versions_author" FOREIGN KEY (author_id) REFERENCES users(id) ON DELETE RESTRICT,
        CONSTRAINT "FK_suite_versions_reviewer" FOREIGN KEY (reviewer_id) REFERENCES users(id) ON DELETE SET NULL
      )`);
    await q.query(`CREATE UNIQUE INDEX suite_versions_suite_version_unique ON suite_versions (suite_id, version)`);
    await q.query(`CREATE INDEX suite_versions_status_idx ON suite_versions (status)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE suite_versions`);
    await q.query(`DROP TABLE suites`);
  }
}
