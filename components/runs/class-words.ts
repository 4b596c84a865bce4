import { DIAGNOSIS_CLASSES } from '../../shared/diagnosis-classes';
import type { DiagnosisClass } from '../../shared/diagnosis-class';

const WORDS: Record<DiagnosisClass, { glyph: string; one: string; many: string; explain: string }> = {
  branch: {
    glyph: '❌',
    one: 'branch finding',
    many: 'branch findings',
    explain:
      'wrong sheet, wrong side of a cut, wrong zero sign, a misplaced jump, a value that is not finite, or two ways of computing that disagree',
  },
  accuracy: {
    glyph: '≈',
    one: 'accuracy finding',
    many: 'accuracy findings',
    explain: 'right sheet and side of every cut, but further from the exact value than the tolerance allows',
  },
};

/** The words of each class of finding, in the order every count shows them (branch first). */
export const CLASS_WORDS = DIAGNOSIS_CLASSES.map((key) => ({
  key,
  glyph: WORDS[key].glyph,
  explain: WORDS[key].explain,
  findings: (count: number) => (count === 1 ? WORDS[key].one : WORDS[key].many),
}));
