import { targetKeySql } from './target-key-sql';

/** What a deviation is matched on, as SQL expressions; `pointKey: null` leaves point-scoped deviations out. */
export interface DeviationMatch {
  targetKey: string;
  suiteSlug: string;
  pathName: string;
  pointKey: string | null;
  diagnosisKind: string;
}

/**
 * SQL that is true when an accepted deviation that is neither revoked nor expired covers what
 * `m` names: the same target key and suite, within the deviation's scope. Called with a failure
 * row aliased `f` by default; the Overview also calls it on regression_groups (no point key).
 */
export function coveredByDeviationSql(f: string, m: DeviationMatch = failureMatch(f)): string {
  return `EXISTS (SELECT 1 FROM deviations d
    WHERE d.classification = 'accepted' AND d.revoked_at IS NULL AND d.expires_at > now()
      AND d.target_key = ${m.targetKey} AND d.suite_slug = ${m.suiteSlug}
      AND (d.scope = 'suite'
        OR (d.scope = 'path' AND d.path_name = ${m.pathName})${m.pointKey ? `\n        OR (d.scope = 'point' AND d.point_key = ${m.pointKey})` : ''}
        OR (d.scope = 'diagnosis' AND d.diagnosis_kind = ${m.diagnosisKind})))`;
}

function failureMatch(f: string): DeviationMatch {
  return {
    targetKey: targetKeySql(`${f}.target_name`),
    suiteSlug: `${f}.suite_slug`,
    pathName: `${f}.path_name`,
    pointKey: `${f}.point_key`,
    diagnosisKind: `${f}.diagnosis_kind`,
  };
}
