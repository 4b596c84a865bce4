import type { EntityManager } from 'typeorm';
import { plural } from '../../shared/plural';
import { checkStoppedSql } from '../sql/check-stopped-sql';
import { SKIP_REASONS_SQL } from '../sql/skip-reasons-sql';
import { targetKeySql } from '../sql/target-key-sql';

/** A check that judged points in the previous completed run and was stopped by an error in this one. */
export interface StoppedCheck {
  suite: string;
  target: string;
  /** The library without its version, as subscriptions and regressions name it. */
  targetKey: string;
  /** Why, as the run page says it: the leading skip reason ("complex.js@2.5.0 has no cbrt"), else the first error, else the points in error. */
  reason: string;
}

/**
 * The checks of a run stopped by an error (server/sql/check-stopped-sql.ts) whose suite and library
 * (any version) were judged in the previous completed run: a library that lost a function, or
 * that now throws on every call, checks nothing and fails no point, so no point regresses; without
 * these, such a nightly sent no mail at all. Checks stopped in both runs are not news and are left out.
 */
export async function newlyStoppedChecks(
  tx: EntityManager,
  runId: string,
  previousId: string,
): Promise<StoppedCheck[]> {
  const rows: (Omit<StoppedCheck, 'reason'> & { reason: string | null; error: string | null; inError: number })[] =
    await tx.query(
      `SELECT s.suite_slug AS suite, s.target_name AS target, ${targetKeySql('s.target_name')} AS "targetKey",
            ${SKIP_REASONS_SQL}->0->>'reason' AS reason,
            s.errors->>0 AS error, coalesce((s.counts->>'error')::int, 0) AS "inError"
       FROM shards s
      WHERE s.run_id = $1 AND ${checkStoppedSql('s')}
        AND EXISTS (SELECT 1 FROM shards p
                     WHERE p.run_id = $2 AND p.suite_slug = s.suite_slug
                       AND ${targetKeySql('p.target_name')} = ${targetKeySql('s.target_name')}
                       AND p.status = 'done' AND NOT ${checkStoppedSql('p')})
      ORDER BY s.suite_slug, s.target_name`,
      [runId, previousId],
    );
  return rows.map((r) => ({
    suite: r.suite,
    target: r.target,
    targetKey: r.targetKey,
    reason: r.reason ?? r.error ?? (r.inError > 0 ? plural(r.inError, 'point') + ' in error' : 'nothing was judged'),
  }));
}
