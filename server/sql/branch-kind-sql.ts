import { diagnosisClass } from '../../shared/diagnosis-class';
import { DIAGNOSIS_KINDS } from '../../shared/diagnosis-kinds';

const ACCURACY_KINDS = DIAGNOSIS_KINDS.filter((k) => diagnosisClass(k) === 'accuracy');

/**
 * SQL that is true when a failure whose leading label is `column` (a diagnosis kind) is a branch
 * finding: its leading label's class is the point's, since labels list branch ones first
 * (shared/point-outcome.ts). A row without a kind counts as branch, as `unexplained` does.
 */
export function branchKindSql(column: string): string {
  return `(${column} IS NULL OR ${column} NOT IN (${ACCURACY_KINDS.map((k) => `'${k}'`).join(', ')}))`;
}
