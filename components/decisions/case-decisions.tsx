import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { DecisionView } from '../../shared/decision-view';
import { SkText } from '../ui/sk-text';
import { DecisionCard } from './decision-card';

/**
 * The decisions that apply to one failure, on its case page: each with what it covers, who
 * decided, until when, and a link to it on the Decisions screen (where it is revoked). Expired
 * ones are shown as expired; none at all is said in words.
 */
export function CaseDecisions({ decisions, failureId }: { decisions: DecisionView[]; failureId: string }) {
  if (decisions.length === 0)
    return (
      <SkText variant="caption" style={styles.small}>
        No decision covers this failure: nobody has called it a bug, a convention difference or an accepted deviation.
      </SkText>
    );
  return (
    <View>
      {decisions.map((d) => (
        <View key={d.id}>
          <DecisionCard decision={d} showFailureLink={d.failureId !== failureId} />
          <Link href={`/decisions?id=${encodeURIComponent(d.id)}`} asChild>
            <Pressable
              accessibilityRole="link"
              accessibilityLabel={`Open this ${d.state === 'in-force' ? '' : 'past '}decision on the Decisions screen`}
              style={StyleSheet.flatten(styles.link)}
            >
              <SkText variant="smallLabel" tone="accent">
                Open on the Decisions screen →
              </SkText>
            </Pressable>
          </Link>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  small: { lineHeight: 19 },
  link: { minHeight: 44, justifyContent: 'center', alignSelf: 'flex-start', marginTop: -theme.space(2) },
});
