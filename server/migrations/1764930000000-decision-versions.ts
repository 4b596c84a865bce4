import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Issue 15: a decision says which versions of its library it covers (`versions`, counted from
 * `target_version`, the version of the failure it was given on; shared/decision-versions.ts).
 * Every decision stored before covered every version, and keeps doing so: `versions` defaults to
 * 'every-version', and `target_version` is filled from the decision's failure where it still exists.
 *
 * The Overview matches deviations against regression groups, so a group now keeps its target's
 * version too; the groups are counted again from the failures marked as regressions, per version
 * (a run whose plan tested two versions of one library had them counted together before).
 */
export class DecisionVersions1764930000000 implements MigrationInterface {
  name = 'DecisionVersions1764930000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(
      `ALTER TABLE deviations
         ADD COLUMN versions text NOT NULL DEFAULT 'every-version',
         ADD COLUMN target_version text,
         ADD CONSTRAINT deviations_versions_known CHECK (versions IN ('this-version', 'this-and-later', 'every-version')),
         ADD CONSTRAINT deviations_versions_have_version CHECK (versions = 'every-version' OR target_version IS NOT NULL)`,
    );
    await q.query(
      `UPDATE deviations d SET target_version = f.target_version FROM failures f WHERE f.id = d.failure_id`,
    );
    await q.query(`ALTER TABLE regression_groups ADD COLUMN target_version text`);
    await this.regroup(q, true);
    await q.query(`ALTER TABLE regression_groups ALTER COLUMN target_version SET NOT NULL`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE regression_groups ALTER COLUMN target_version DROP NOT NULL`);
    await this.regroup(q, false);
    await q.query(`ALTER TABLE regression_groups DROP COLUMN target_version`);
    await q.query(
      `ALTER TABLE deviations DROP CONSTRAINT deviations_versions_have_version,
         DROP CONSTRAINT deviations_versions_known, DROP COLUMN target_version, DROP COLUMN versions`,
    );
  }

  /** Counts every run's regression groups again from its marked failures, with or without the version. */
  private async regroup(q: QueryRunner, byVersion: boolean): Promise<void> {
    const version = byVersion ? ', target_version' : '';
    // The target key (the name without its version) written out, not taken from server/sql: a
    // migration must keep doing what it did when a later change touches the application's helper.
    await q.query(`DELETE FROM regression_groups`);
    await q.query(
      `INSERT INTO regression_groups (run_id, target_key, suite_slug, path_name, diagnosis_kind${version}, count)
       SELECT run_id, regexp_replace(target_name, '@[^/]+', ''), suite_slug, path_name, diagnosis_kind${version}, count(*)::int
         FROM failures WHERE is_regression
        GROUP BY run_id, 2, suite_slug, path_name, diagnosis_kind${version}`,
    );
  }
}
