import type { DiagnosisKind } from './diagnosis';

/** Every diagnosis kind, in the order the app lists them. */
export const DIAGNOSIS_KINDS = [
  'other-sheet',
  'cut-side',
  'zero-sign',
  'misplaced-cut',
  'inaccurate',
  'not-finite',
  'unexplained',
] as const satisfies readonly DiagnosisKind[];
