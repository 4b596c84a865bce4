import { deviationAppliesSql, type DeviationMatch } from './deviation-applies-sql';
import { failureMatchSql } from './failure-match-sql';

/**
 * SQL that is true when an accepted deviation that is neither revoked nor expired covers what
 * `m` names (deviationAppliesSql). Called with a failure row aliased `f` by default; the Overview
 * also calls it on regression_groups (no point key).
 */
export function coveredByDeviationSql(f: string, m: DeviationMatch = failureMatchSql(f)): string {
  return `EXISTS (SELECT 1 FROM deviations d
    WHERE d.classification = 'accepted' AND d.revoked_at IS NULL AND d.expires_at > now()
      AND ${deviationAppliesSql('d', m)})`;
}
