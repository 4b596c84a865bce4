import type { ClassifyBody } from '../../shared/schemas/classify-body';

/** Each verdict in words, for the verdict form's chips, the Decisions screen, the case page and the table's mark. */
export const CLASSIFICATION_WORDS: Record<ClassifyBody['classification'], string> = {
  bug: 'bug',
  'convention-difference': 'convention difference',
  accepted: 'accepted deviation',
};
