import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Runs, their shards, every failing point, and per-path summaries of what passed. */
export class RunsShardsFailures1764730000000 implements MigrationInterface {
  name = 'RunsShardsFailures1764730000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE runs (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        plan_id uuid,
        plan_name text NOT NULL,
        trigger text NOT NULL,
        requested_by uuid,
        status text NOT NULL,
        shards_total integer NOT NULL,
        shards_done integer NOT NULL DEFAULT 0,
        counts jsonb NOT NULL,
        regressions integer,
        created_at timestamptz NOT NULL DEFAULT now(),
        started_at timestamptz,
        finished_at timestamptz,
        CONSTRAINT runs_status_known CHECK (status IN ('queued', 'running', 'completed', 'failed', 'cancelled')),
        CONSTRAINT runs_trigger_known CHECK (trigger IN ('schedule', 'manual', 'api')),
        CONSTRAINT "FK_runs_plan" FOREIGN KEY (plan_id) REFERENCES plans(id) ON DELETE SET NULL,
        CONSTRAINT "FK_runs_requested_by" FOREIGN KEY (requested_by) REFERENCES users(id) ON DELETE SET NULL
      )`);
    await q.query(`CREATE INDEX runs_plan_created_idx ON runs (plan_id, created_at)`);
    await q.query(`
      CREATE TABLE shards (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        run_id uuid NOT NULL,
        suite_version_id uuid NOT NULL,
        suite_slug text NOT NULL,
        target_name text NOT NULL,
        target_library text NOT NULL,
        target_version text NOT NULL,
        status text NOT NULL,
        outcome text,
        attempts integer NOT NULL DEFAULT 0,
        counts jsonb,
        by_diagnosis jsonb,
        checked jsonb,
        errors jsonb NOT NULL DEFAULT '[]',
        duration_ms integer,
        finished_at timestamptz,
        CONSTRAINT shards_status_known CHECK (status IN ('queued', 'running', 'done', 'cancelled')),
        CONSTRAINT "FK_shards_run" FOREIGN KEY (run_id) REFERENCES runs(id) ON DELETE CASCADE,
        CONSTRAINT "FK_shards_suite_version" FOREIGN KEY (suite_version_id) REFERENCES suite_versions(id) ON DELETE RESTRICT
      )`);
    await q.query(`CREATE INDEX shards_run_idx ON shards (run_id)`);
    await q.query(`
      CREATE TABLE failures (
        id bigint GENERATED ALWAYS AS IDENTITY PRIMARY KEY,
        run_id uuid NOT NULL,
        shard_id uuid NOT NULL,
        suite_slug text NOT NULL,
        suite_version integer NOT NULL,
        target_name text NOT NULL,
        target_library text NOT NULL,
        target_version text NOT NULL,
        convention text NOT NULL,
        path_name text NOT NULL,
        point_index integer NOT NULL,
        t double precision NOT NULL,
        label text,
        z jsonb NOT NULL,
        z_hex jsonb NOT NULL,
        point_key text NOT NULL,
        expected jsonb,
        actual jsonb,
        outcome_kind text NOT NULL,
        diagnosis_kind text,
        diagnosis jsonb,
        ulps double precision,
        relative_error double precision,
        rule text NOT NULL,
        reproducer text NOT NULL,
        limits jsonb,
        is_regression boolean NOT NULL DEFAULT false,
        CONSTRAINT "FK_failures_run" FOREIGN KEY (run_id) REFERENCES runs(id) ON DELETE CASCADE,
        CONSTRAINT "FK_failures_shard" FOREIGN KEY (shard_id) REFERENCES shards(id) ON DELETE CASCADE
      )`);
    await q.query(`CREATE INDEX failures_run_idx ON failures (run_id, id)`);
    await q.query(`CREATE INDEX failures_point_key_idx ON failures (point_key)`);
    await q.query(`CREATE INDEX failures_run_diagnosis_idx ON failures (run_id, diagnosis_kind)`);
    await q.query(`
      CREATE TABLE path_summaries (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        run_id uuid NOT NULL,
        shard_id uuid NOT NULL,
        path_name text NOT NULL,
        kind text NOT NULL,
        points integer NOT NULL,
        counts jsonb NOT NULL,
        by_diagnosis jsonb NOT NULL,
        jumps jsonb,
        monodromy jsonb,
        skipped jsonb NOT NULL,
        error text,
        CONSTRAINT "FK_path_summaries_run" FOREIGN KEY (run_id) REFERENCES runs(id) ON DELETE CASCADE,
        CONSTRAINT "FK_path_summaries_shard" FOREIGN KEY (shard_id) REFERENCES shards(id) ON DELETE CASCADE
      )`);
    await q.query(`CREATE INDEX path_summaries_run_idx ON path_summaries (run_id)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE path_summaries`);
    await q.query(`DROP TABLE failures`);
    await q.query(`DROP TABLE shards`);
    await q.query(`DROP TABLE runs`);
  }
}
