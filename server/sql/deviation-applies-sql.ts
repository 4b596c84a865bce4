import { versionOrderSql } from './version-order-sql';

/** What a deviation is matched on, as SQL expressions; `pointKey: null` leaves point-scoped deviations out. */
export interface DeviationMatch {
  targetKey: string;
  targetVersion: string;
  suiteSlug: string;
  pathName: string;
  pointKey: string | null;
  diagnosisKind: string;
}

/**
 * SQL that is true when the deviation aliased `d` applies to what `m` names, whatever its
 * classification and state: the same library and suite, within its scope, on a version it covers
 * (shared/decision-versions.ts; 'every-version' is every decision stored before versions were).
 */
export function deviationAppliesSql(d: string, m: DeviationMatch): string {
  return `${d}.target_key = ${m.targetKey} AND ${d}.suite_slug = ${m.suiteSlug}
      AND (${d}.scope = 'suite'
        OR (${d}.scope = 'path' AND ${d}.path_name = ${m.pathName})${m.pointKey ? `\n        OR (${d}.scope = 'point' AND ${d}.point_key = ${m.pointKey})` : ''}
        OR (${d}.scope = 'diagnosis' AND ${d}.diagnosis_kind = ${m.diagnosisKind}))
      AND (${d}.versions = 'every-version'
        OR (${d}.versions = 'this-version' AND ${d}.target_version = ${m.targetVersion})
        OR (${d}.versions = 'this-and-later' AND ${versionOrderSql(m.targetVersion)} >= ${versionOrderSql(`${d}.target_version`)}))`;
}
