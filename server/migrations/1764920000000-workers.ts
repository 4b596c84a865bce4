import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Workers announce themselves: one row per process with shard workers (the server, each `npm run
 * worker`), the targets it takes, and when it started, last beat and stopped. A shard keeps the
 * last worker that took it. The partial index serves the claim (sql-shard-queue.ts), which looks
 * only at queued shards of the worker's targets.
 */
export class Workers1764920000000 implements MigrationInterface {
  name = 'Workers1764920000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(
      `CREATE TABLE workers (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        label text NOT NULL,
        targets text[] NOT NULL,
        started_at timestamptz NOT NULL DEFAULT now(),
        heartbeat_at timestamptz NOT NULL DEFAULT now(),
        stopped_at timestamptz
      )`,
    );
    await q.query(
      `ALTER TABLE shards ADD COLUMN worker_id uuid,
         ADD CONSTRAINT "FK_shards_worker" FOREIGN KEY (worker_id) REFERENCES workers(id) ON DELETE SET NULL`,
    );
    await q.query(`CREATE INDEX shards_queued_target_idx ON shards (target_name) WHERE status = 'queued'`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX shards_queued_target_idx`);
    await q.query(`ALTER TABLE shards DROP CONSTRAINT "FK_shards_worker", DROP COLUMN worker_id`);
    await q.query(`DROP TABLE workers`);
  }
}
