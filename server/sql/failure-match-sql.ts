import type { DeviationMatch } from './deviation-applies-sql';
import { targetKeySql } from './target-key-sql';

/** A failure row aliased `f` as what deviations are matched on. */
export function failureMatchSql(f: string): DeviationMatch {
  return {
    targetKey: targetKeySql(`${f}.target_name`),
    targetVersion: `${f}.target_version`,
    suiteSlug: `${f}.suite_slug`,
    pathName: `${f}.path_name`,
    pointKey: `${f}.point_key`,
    diagnosisKind: `${f}.diagnosis_kind`,
  };
}
