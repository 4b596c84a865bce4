import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Who wrote a draft before someone else edited it and so became its author (the four-eyes rule
 * follows the last editor; the version shows whose draft was taken over).
 */
export class SuiteVersionTakenOverFrom1764887400000 implements MigrationInterface {
  name = 'SuiteVersionTakenOverFrom1764887400000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(
      `ALTER TABLE suite_versions ADD COLUMN taken_over_from_id uuid,
         ADD CONSTRAINT "FK_suite_versions_taken_over_from" FOREIGN KEY (taken_over_from_id) REFERENCES users(id) ON DELETE SET NULL`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(
      `ALTER TABLE suite_versions DROP CONSTRAINT "FK_suite_versions_taken_over_from", DROP COLUMN taken_over_from_id`,
    );
  }
}
