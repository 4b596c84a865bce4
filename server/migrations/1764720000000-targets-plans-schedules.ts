import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Installed targets, plans (suites × targets, recipients), schedules and their claimed firings. */
export class TargetsPlansSchedules1764720000000 implements MigrationInterface {
  name = 'TargetsPlansSchedules1764720000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE targets (
        name text PRIMARY KEY,
        library text NOT NULL,
        version text NOT NULL,
        settings jsonb NOT NULL,
        installed boolean NOT NULL,
        last_seen_at timestamptz NOT NULL
      )`);
    await q.query(`
      CREATE TABLE plans (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        name text NOT NULL,
        description text NOT NULL DEFAULT '',
        recipients text[] NOT NULL,
        created_by uuid NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT "UQ_plans_name" UNIQUE (name),
        CONSTRAINT "FK_plans_created_by" FOREIGN KEY (created_by) REFERENCES users(id) ON DELETE RESTRICT
      )`);
    await q.query(`
      CREATE TABLE plan_suites (
        plan_id uuid NOT NULL,
        suite_id uuid NOT NULL,
        PRIMARY KEY (plan_id, suite_id),
        CONSTRAINT "FK_plan_suites_plan" FOREIGN KEY (plan_id) REFERENCES plans(id) ON DELETE CASCADE ON UPDATE CASCADE,
        CONSTRAINT "FK_plan_suites_suite" FOREIGN KEY (suite_id) REFERENCES suites(id) ON DELETE CASCADE ON UPDATE CASCADE
      )`);
    // Join-table index names are the ones TypeORM derives for plan_suites/plan_targets, so the
    // migration test finds nothing for synchronize to change.
    await q.query(`CREATE INDEX "IDX_4ab16c842cfbbd0eacb933f1fe" ON plan_suites (plan_id)`);
    await q.query(`CREATE INDEX "IDX_3898a667b57638c14f05868cfd" ON plan_suites (suite_id)`);
    await q.query(`
      CREATE TABLE plan_targets (
        plan_id uuid NOT NULL,
        target_name text NOT NULL,
        PRIMARY KEY (plan_id, target_name),
        CONSTRAINT "FK_plan_targets_plan" FOREIGN KEY (plan_id) REFERENCES plans(id) ON DELETE CASCADE ON UPDATE CASCADE,
        CONSTRAINT "FK_plan_targets_target" FOREIGN KEY (target_name) REFERENCES targets(name) ON DELETE CASCADE ON UPDATE CASCADE
      )`);
    await q.query(`CREATE INDEX "IDX_117744780664c4da6db5113a6e" ON plan_targets (plan_id)`);
    await q.query(`CREATE INDEX "IDX_3354bebd99eef3aa7d854ada72" ON plan_targets (target_name)`);
    await q.query(`
      CREATE TABLE schedules (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        plan_id uuid NOT NULL,
        cron text NOT NULL,
        time_zone text NOT NULL,
        enabled boolean NOT NULL DEFAULT true,
        created_by uuid NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT "FK_schedules_plan" FOREIGN KEY (plan_id) REFERENCES plans(id) ON DELETE CASCADE,
        CONSTRAINT "FK_schedules_created_by" FOREIGN KEY (created_by) REFERENCES users(id) ON DELETE RESTRICT
      )`);
    await q.query(`
      CREATE TABLE schedule_firings (
        schedule_id uuid NOT NULL,
        due_at timestamptz NOT NULL,
        fired_at timestamptz NOT NULL DEFAULT now(),
        outcome text,
        PRIMARY KEY (schedule_id, due_at),
        CONSTRAINT "FK_schedule_firings_schedule" FOREIGN KEY (schedule_id) REFERENCES schedules(id) ON DELETE CASCADE
      )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE schedule_firings`);
    await q.query(`DROP TABLE schedules`);
    await q.query(`DROP TABLE plan_targets`);
    await q.query(`DROP TABLE plan_suites`);
    await q.query(`DROP TABLE plans`);
    await q.query(`DROP TABLE targets`);
  }
}
