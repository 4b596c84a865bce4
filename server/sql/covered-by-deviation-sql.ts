import { targetKeySql } from './target-key-sql';

/**
 * SQL that is true when the failure row aliased `f` is covered by an accepted deviation that is
 * neither revoked nor expired, on the same target key and suite, within the deviation's scope.
 */
export function coveredByDeviationSql(f: string): string {
  return `EXISTS (SELECT 1 FROM deviations d
    WHERE d.classification = 'accepted' AND d.revoked_at IS NULL AND d.expires_at > now()
      AND d.target_key = ${targetKeySql(`${f}.target_name`)} AND d.suite_slug = ${f}.suite_slug
      AND (d.scope = 'suite'
        OR (d.scope = 'path' AND d.path_name = ${f}.path_name)
        OR (d.scope = 'point' AND d.point_key = ${f}.point_key)
        OR (d.scope = 'diagnosis' AND d.diagnosis_kind = ${f}.diagnosis_kind)))`;
}
