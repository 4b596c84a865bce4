import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Uploaded suite files and reference tables, with what each produced. */
export class Uploads1764770000000 implements MigrationInterface {
  name = 'Uploads1764770000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE uploads (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        kind text NOT NULL,
        suite_version_id uuid,
        filename text NOT NULL,
        bytes integer NOT NULL,
        summary jsonb NOT NULL,
        uploaded_by uuid NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT uploads_kind_known CHECK (kind IN ('suite-file', 'reference-table')),
        CONSTRAINT "FK_uploads_suite_version" FOREIGN KEY (suite_version_id) REFERENCES suite_versions(id) ON DELETE SET NULL,
        CONSTRAINT "FK_uploads_uploaded_by" FOREIGN KEY (uploaded_by) REFERENCES users(id) ON DELETE RESTRICT
      )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE uploads`);
  }
}
