import type { DiagnosisKind } from './diagnosis';

/** Every diagnosis kind, in the order the app lists them: branch findings first (diagnosis-class.ts), accuracy last. */
export const DIAGNOSIS_KINDS = [
  'other-sheet',
  'cut-side',
  'zero-sign',
  'misplaced-cut',
  'not-finite',
  'disagreement',
  'unexplained',
  'inaccurate',
] as const satisfies readonly DiagnosisKind[];
