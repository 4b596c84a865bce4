import { DIAGNOSIS_CLASSES } from '../../shared/diagnosis-classes';

/**
 * Where a failure comes in a list: its class's position in DIAGNOSIS_CLASSES (branch 0, accuracy
 * 1), then errors and skipped points (no class). The indexes failures_run_rank_idx and
 * failures_run_rank_ulps_idx (migration 1764900000000) are built on this very expression, which
 * PostgreSQL matches only when it is the same; `tests/server/sql/finding-rank-sql.test.ts` holds
 * the two together. `column` is the finding_class column, qualified or not.
 */
export function findingRankSql(column = 'finding_class'): string {
  const whens = DIAGNOSIS_CLASSES.map((c, i) => `WHEN '${c}' THEN ${i}`).join(' ');
  return `CASE ${column} ${whens} ELSE ${DIAGNOSIS_CLASSES.length} END`;
}
