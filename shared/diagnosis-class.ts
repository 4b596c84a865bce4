import type { DiagnosisKind } from './diagnosis';

/**
 * The two kinds of finding a maintainer acts on differently. A branch finding says the value is
 * on the wrong sheet, the wrong side of a cut, has a wrong zero sign, jumps where it should not,
 * is not finite, disagrees with another way of computing it, or is far (> 10 %) from every value
 * we know how to compute; an accuracy finding says the value is on the right branch but further
 * from the reference than the tolerance allows. Branch findings lead every table, count, mail
 * and CLI summary, and set their own exit code.
 */
export type DiagnosisClass = 'branch' | 'accuracy';

const CLASS: Readonly<Record<DiagnosisKind, DiagnosisClass>> = {
  'other-sheet': 'branch',
  'cut-side': 'branch',
  'zero-sign': 'branch',
  'misplaced-cut': 'branch',
  'not-finite': 'branch',
  disagreement: 'branch',
  unexplained: 'branch',
  inaccurate: 'accuracy',
};

/** The class of a diagnosis kind. */
export function diagnosisClass(kind: DiagnosisKind): DiagnosisClass {
  return CLASS[kind];
}
