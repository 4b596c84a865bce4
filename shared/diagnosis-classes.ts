import type { DiagnosisClass } from './diagnosis-class';

/** Every class of finding in the order every list, count and mail shows them: branch findings first. */
export const DIAGNOSIS_CLASSES = ['branch', 'accuracy'] as const satisfies readonly DiagnosisClass[];
