import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Targets added by admins on the Libraries screen (issue 14, item 1). One row per source, unique
 * as jsonb (key order does not matter there), so the same source cannot be added twice. Removing
 * a row only marks its targets not installed in `targets`: runs and failures keep their names.
 */
export class TargetSources1764910000000 implements MigrationInterface {
  name = 'TargetSources1764910000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE target_sources (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        source jsonb NOT NULL,
        state text NOT NULL DEFAULT 'resolving',
        targets jsonb NOT NULL DEFAULT '[]',
        error text,
        added_by uuid,
        added_at timestamptz NOT NULL DEFAULT now(),
        resolved_at timestamptz,
        CONSTRAINT target_sources_source_unique UNIQUE (source),
        CONSTRAINT target_sources_state_known CHECK (state IN ('resolving', 'ready', 'failed')),
        CONSTRAINT "FK_target_sources_added_by" FOREIGN KEY (added_by) REFERENCES users(id) ON DELETE SET NULL
      )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE target_sources`);
  }
}
