import { theme } from '../../constants/theme';
import type { DecisionMark } from '../../shared/decision-mark';
import { TagPill } from '../ui/tag-pill';
import { decisionMarkWords } from './decision-mark-words';

/** The mark on a failure-table row (and a phone's card) that a decision in force covers it; the case page says which and links to it. */
export function DecisionMarker({ mark }: { mark: DecisionMark }) {
  const words = decisionMarkWords(mark);
  return (
    <TagPill
      text={words}
      ink={theme.color.inkSoft}
      soft={theme.color.panel}
      edge={theme.color.rule}
      accessibilityLabel={`A decision covers this failure: ${words}`}
    />
  );
}
