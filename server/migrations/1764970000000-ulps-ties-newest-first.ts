import type { MigrationInterface, QueryRunner } from 'typeorm';

const RANK = `(CASE finding_class WHEN 'branch' THEN 0 WHEN 'accuracy' THEN 1 ELSE 2 END)`;

/**
 * The failure table sorted by error lists equal errors newest first, as the default order
 * does: branch findings carry no ulps, so with `sort=ulps` every one of them ties at 0, and
 * they were listed oldest first. The two ulps indexes end in `-id` instead of `id`, so a page
 * is still one index range and the next page's cursor an index condition.
 */
export class UlpsTiesNewestFirst1764970000000 implements MigrationInterface {
  name = 'UlpsTiesNewestFirst1764970000000';

  async up(q: QueryRunner): Promise<void> {
    await this.rebuild(q, '(-id)');
  }

  async down(q: QueryRunner): Promise<void> {
    await this.rebuild(q, 'id');
  }

  private async rebuild(q: QueryRunner, last: string): Promise<void> {
    await q.query(`DROP INDEX failures_run_rank_ulps_idx`);
    await q.query(`DROP INDEX failures_run_kind_rank_ulps_idx`);
    await q.query(
      `CREATE INDEX failures_run_rank_ulps_idx ON failures (run_id, ${RANK}, (coalesce(ulps, 0)) DESC, ${last})`,
    );
    await q.query(
      `CREATE INDEX failures_run_kind_rank_ulps_idx ON failures (run_id, diagnosis_kind, ${RANK}, (coalesce(ulps, 0)) DESC, ${last})`,
    );
  }
}
