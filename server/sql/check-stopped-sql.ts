/**
 * shared/check-stopped-by-error.ts in SQL, over a `shards` row aliased `alias`: its outcome is an
 * error, or it is done and judged no point (none passed or failed). The matrix's error cells, the
 * run's `checks_stopped` and the regression mail's stopped checks all follow that one rule
 * (tests/server/runs/newly-stopped-checks.test.ts holds this form to it).
 */
export const checkStoppedSql = (alias: string): string =>
  `(${alias}.outcome = 'error' OR (${alias}.status = 'done'
     AND coalesce((${alias}.counts->>'pass')::int, 0) + coalesce((${alias}.counts->>'fail')::int, 0) = 0))`;
