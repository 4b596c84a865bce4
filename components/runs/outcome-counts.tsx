import { StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { OutcomeCounts as Counts } from '../../shared/run-result';
import { SkText } from '../ui/sk-text';
import { OUTCOME_GLYPH } from './outcome-glyph';
import { OUTCOME_TONE, type Tone } from './outcome-tone';

const ORDER = [
  { key: 'pass', word: 'passed', tone: 'pass' },
  { key: 'fail', word: 'failed', tone: 'fail' },
  { key: 'error', word: 'error', tone: 'error' },
  { key: 'skipped', word: 'skipped', tone: 'neutral' },
] as const satisfies readonly { key: keyof Counts; word: string; tone: Tone }[];

/**
 * Point counts as "✓ 120 passed · ❌ 3 failed …": each with its glyph and word as well as its
 * colour. Zero counts are left out unless `all`; nothing counted says so.
 */
export function OutcomeCounts({
  counts,
  all = false,
  compact = false,
}: {
  counts: Counts;
  all?: boolean;
  compact?: boolean;
}) {
  const shown = ORDER.filter((o) => all || counts[o.key] > 0);
  if (shown.length === 0)
    return (
      <SkText variant="caption" tone="inkFaint">
        no points counted yet
      </SkText>
    );
  return (
    <View style={styles.row} accessibilityLabel={shown.map((o) => `${counts[o.key]} ${o.word}`).join(', ')}>
      {shown.map((o) => (
        <Text
          key={o.key}
          style={[
            styles.item,
            compact && styles.compact,
            { color: counts[o.key] > 0 ? OUTCOME_TONE[o.tone].ink : theme.color.inkFaint },
          ]}
        >
          {OUTCOME_GLYPH[o.key]} {counts[o.key].toLocaleString('en-GB')} {o.word}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', columnGap: theme.space(3), rowGap: theme.space(1) },
  item: { fontFamily: theme.font.medium, fontSize: theme.size.body },
  compact: { fontSize: theme.size.small },
});
