import type { DecisionMark } from '../../shared/decision-mark';
import { CLASSIFICATION_WORDS } from './classification-words';

/** A row's decision in force in a few words: "accepted deviation until 2027-01-31", "bug (decided)". */
export function decisionMarkWords(mark: DecisionMark): string {
  const words = CLASSIFICATION_WORDS[mark.classification];
  return mark.expiresAt ? `${words} until ${mark.expiresAt.slice(0, 10)}` : `${words} (decided)`;
}
