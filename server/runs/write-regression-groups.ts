import type { EntityManager } from 'typeorm';
import { targetKeySql } from '../sql/target-key-sql';

/**
 * Writes the Overview's regression counts of a completed run (entities/regression-group.ts)
 * from its failures marked as regressions; markRegressions calls it in the transaction that marks them.
 */
export async function writeRegressionGroups(tx: Pick<EntityManager, 'query'>, runId: string): Promise<void> {
  await tx.query(
    `INSERT INTO regression_groups (run_id, target_key, target_version, suite_slug, path_name, diagnosis_kind, count)
     SELECT run_id, ${targetKeySql('target_name')}, target_version, suite_slug, path_name, diagnosis_kind, count(*)::int
       FROM failures WHERE run_id = $1 AND is_regression
      GROUP BY run_id, 2, target_version, suite_slug, path_name, diagnosis_kind`,
    [runId],
  );
}
