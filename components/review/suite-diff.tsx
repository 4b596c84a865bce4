import { StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { SuiteVersionView } from '../../shared/suite-version-view';
import { SkText } from '../ui/sk-text';
import { diffSuiteBodies } from './diff-suite-bodies';

/**
 * What a submitted version changes against the version before it, field by field: the old
 * value marked "−", the new one "+", each with a word, so the diff reads without colour.
 */
export function SuiteDiff({ current, previous }: { current: SuiteVersionView; previous: SuiteVersionView | null }) {
  if (!previous) {
    return (
      <SkText variant="body" tone="inkSoft" testID="suite-diff">
        Version {current.version} is the first version: there is nothing to compare it with, so every field below is
        new.
      </SkText>
    );
  }
  const changes = diffSuiteBodies(previous.body, current.body);
  const count = (k: string) => changes.filter((c) => c.change === k).length;
  return (
    <View style={styles.box} testID="suite-diff">
      <SkText variant="label">
        Against version {previous.version} ({previous.status.replace('-', ' ')}): {count('changed')} changed,{' '}
        {count('added')} added, {count('removed')} removed.
      </SkText>
      {changes.length === 0 ? (
        <SkText variant="body" tone="inkSoft">
          No field differs from version {previous.version}.
        </SkText>
      ) : null}
      {changes.map((c) => (
        <View key={`${c.change} ${c.field}`} style={styles.row} accessibilityLabel={`${c.field} ${c.change}`}>
          <SkText variant="mono">
            {c.field} <Text style={styles.word}>· {c.change}</Text>
          </SkText>
          {c.before !== null ? (
            <Text style={[styles.value, styles.before]} accessibilityLabel={`was ${c.before}`}>
              − was {c.before}
            </Text>
          ) : null}
          {c.after !== null ? (
            <Text style={[styles.value, styles.after]} accessibilityLabel={`now ${c.after}`}>
              + now {c.after}
            </Text>
          ) : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(2) },
  row: { gap: 2, borderLeftWidth: 3, borderLeftColor: theme.color.focus, paddingLeft: theme.space(2) },
  word: { fontFamily: theme.font.regular, color: theme.color.inkFaint },
  value: { fontFamily: theme.font.mono, fontSize: 13, paddingHorizontal: theme.space(1), borderRadius: 3 },
  before: { backgroundColor: theme.color.dangerSoft, color: theme.color.ink, textDecorationLine: 'line-through' },
  after: { backgroundColor: theme.color.accentSoft, color: theme.color.ink },
});
