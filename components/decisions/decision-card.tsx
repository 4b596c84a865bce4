import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { formatDate } from '../../client/format-date';
import { describeDecisionScope } from '../../shared/describe-decision-scope';
import type { DecisionView } from '../../shared/decision-view';
import { ACTION_ROW_STYLE } from '../ui/action-row-style';
import { ConfirmAction } from '../ui/confirm-action';
import { SkText } from '../ui/sk-text';
import { CLASSIFICATION_WORDS } from './classification-words';
import { decisionStateWords } from './decision-state-words';

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/**
 * One decision: the verdict and where it stands, what it covers in the words the form used
 * before saving, why, who decided and when, the failure it was given on, and (for those who may)
 * revoke, asked twice. Expired and revoked decisions stay, marked as no longer applying.
 */
export function DecisionCard({
  decision: d,
  onRevoke,
  revoking = false,
  showFailureLink = true,
}: {
  decision: DecisionView;
  /** Given when the reader may revoke (reviewers and admins). */
  onRevoke?: () => void;
  revoking?: boolean;
  /** The case page shows a decision on its own failure without a link to itself. */
  showFailureLink?: boolean;
}) {
  const inForce = d.state === 'in-force';
  const verdict = CLASSIFICATION_WORDS[d.classification];
  return (
    <View style={styles.row} testID={`decision-${d.id}`}>
      <View style={styles.words}>
        <SkText variant="label">
          {capital(verdict)}
          <SkText variant="smallLabel" tone={inForce ? 'accent' : 'inkSoft'}>
            {' '}
            · {decisionStateWords(d)}
          </SkText>
        </SkText>
        <SkText variant="body">Covers {describeDecisionScope(d)}.</SkText>
        <SkText variant="caption" tone="inkSoft">
          “{d.reason}”
        </SkText>
        <SkText variant="caption">
          Decided by {d.createdBy} on {formatDate(d.createdAt)}
        </SkText>
        {showFailureLink && d.failureId ? (
          <Link href={`/failures/${d.failureId}`} asChild>
            <Pressable accessibilityRole="link" style={StyleSheet.flatten(styles.link)}>
              <SkText variant="smallLabel" tone="accent">
                Given on failure #{d.failureId}
              </SkText>
            </Pressable>
          </Link>
        ) : null}
      </View>
      {onRevoke && inForce ? (
        <View style={styles.action}>
          <ConfirmAction
            label="Revoke"
            accessibilityLabel={`Revoke the ${verdict} on ${d.suiteSlug}`}
            question={`Revoke this ${verdict}? The failures it covers count as ${d.classification === 'accepted' ? 'known, or as regressions in later runs,' : 'undecided'} from now on.`}
            confirmLabel="Yes, revoke"
            busy={revoking}
            onConfirm={onRevoke}
          />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: ACTION_ROW_STYLE,
  words: { flexGrow: 1, flexShrink: 1, flexBasis: 260, gap: 2 },
  link: { minHeight: 44, justifyContent: 'center', alignSelf: 'flex-start' },
  action: { flexShrink: 0, maxWidth: '100%' },
});
