import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Property checks of each shard, with seeds and shrunk counterexamples. */
export class PropertyResults1764790000000 implements MigrationInterface {
  name = 'PropertyResults1764790000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE property_results (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        run_id uuid NOT NULL,
        shard_id uuid NOT NULL,
        law text NOT NULL,
        kind text NOT NULL,
        seed bigint NOT NULL,
        outcome jsonb NOT NULL,
        CONSTRAINT "FK_property_results_run" FOREIGN KEY (run_id) REFERENCES runs(id) ON DELETE CASCADE,
        CONSTRAINT "FK_property_results_shard" FOREIGN KEY (shard_id) REFERENCES shards(id) ON DELETE CASCADE
      )`);
    await q.query(`CREATE INDEX property_results_run_idx ON property_results (run_id)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE property_results`);
  }
}
