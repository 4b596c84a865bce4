import type { DiagnosisKind } from './diagnosis';

/**
 * The name of each diagnosis kind and what it means, in the words every reader sees: the
 * diagnosis chips and filters, the findings-by-kind picture of a plan, the case page and the
 * regression mail. The order they are listed in is DIAGNOSIS_KINDS (diagnosis-kinds.ts), their
 * class diagnosis-class.ts; a new kind gets its name here and tsc names any place that lacks it.
 */
export const DIAGNOSIS_KIND_NAMES: Readonly<Record<DiagnosisKind, { name: string; explain: string }>> = {
  'other-sheet': { name: 'other sheet', explain: 'the value is the expected one on another sheet' },
  'cut-side': {
    name: 'wrong side of a cut',
    explain: 'the value is the limit from the other side of the cut',
  },
  'zero-sign': { name: 'ignored zero sign', explain: 'a ±0 was treated as the other sign' },
  'misplaced-cut': { name: 'misplaced cut', explain: 'a jump where none is expected, or none where one is' },
  'not-finite': {
    name: 'not finite',
    explain: 'an infinite or NaN part where the reference is finite, or the reverse',
  },
  disagreement: {
    name: 'disagreement',
    explain: 'another subject or entry of the same library gives a different value here',
  },
  unexplained: { name: 'unexplained', explain: 'none of the alternatives we know how to compute' },
  inaccurate: { name: 'inaccurate', explain: 'right sheet and side of every cut, error over the tolerance' },
};
