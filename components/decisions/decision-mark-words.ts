import type { DecisionMark } from '../../shared/decision-mark';

/**
 * A row's decision in force in a few words, short enough for the table's diagnosis column:
 * "accepted until 2027-01-31", "called a bug", "convention difference".
 */
export function decisionMarkWords(mark: DecisionMark): string {
  if (mark.classification === 'accepted')
    return mark.expiresAt ? `accepted until ${mark.expiresAt.slice(0, 10)}` : 'accepted';
  return mark.classification === 'bug' ? 'called a bug' : 'convention difference';
}
