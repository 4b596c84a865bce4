import type { DiagnosisKind } from '../../../shared/diagnosis';
import { diagnosisClass } from '../../../shared/diagnosis-class';
import { DIAGNOSIS_KINDS } from '../../../shared/diagnosis-kinds';

/**
 * Label counts grouped by class, branch first, each in the app's order (diagnosis-kinds.ts):
 * "branch: zero-sign 117, cut-side 44; accuracy: inaccurate 816"; empty when there are none.
 */
export function describeLabelCounts(byDiagnosis: Partial<Record<DiagnosisKind, number>>): string {
  return (['branch', 'accuracy'] as const)
    .map((cls) => ({
      cls,
      kinds: DIAGNOSIS_KINDS.filter((k) => diagnosisClass(k) === cls && (byDiagnosis[k] ?? 0) > 0),
    }))
    .filter((g) => g.kinds.length > 0)
    .map((g) => `${g.cls}: ${g.kinds.map((k) => `${k} ${byDiagnosis[k]}`).join(', ')}`)
    .join('; ');
}
