import { StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { ClassCounts, OutcomeCounts as Counts } from '../../shared/run-result';
import { SkText } from '../ui/sk-text';
import { CLASS_WORDS } from './class-words';
import { OUTCOME_GLYPH } from './outcome-glyph';
import { OUTCOME_TONE, type Tone } from './outcome-tone';

type Item = { key: string; count: number; text: string; said: string; tone: Tone };

const n = (x: number) => x.toLocaleString('en-GB');

/**
 * Point counts as "❌ 3 branch findings · ≈ 5 accuracy findings · ✓ 120 passed …": each with
 * its glyph and word as well as its colour. Given `byClass`, failures are counted by class,
 * branch findings first, since a wrong sheet, side or zero sign is what a maintainer acts on
 * first; without it (a count from before there were classes) they are one "failed" count.
 * Points the target's entry cannot express are counted beside the skipped ones, never as
 * failures. Zero counts are left out unless `all`; nothing counted says so.
 */
export function OutcomeCounts({
  counts,
  byClass,
  all = false,
  compact = false,
}: {
  counts: Counts;
  byClass?: ClassCounts | null;
  all?: boolean;
  compact?: boolean;
}) {
  const item = (key: keyof Counts, word: string, tone: Tone): Item => {
    const count = counts[key] ?? 0;
    return { key, count, text: `${OUTCOME_GLYPH[key]} ${n(count)} ${word}`, said: `${n(count)} ${word}`, tone };
  };
  const failures: Item[] =
    byClass && byClass.branch + byClass.accuracy === counts.fail
      ? CLASS_WORDS.map((c) => ({
          key: c.key,
          count: byClass[c.key],
          text: `${c.glyph} ${n(byClass[c.key])} ${c.findings(byClass[c.key])}`,
          said: `${n(byClass[c.key])} ${c.findings(byClass[c.key])}`,
          tone: c.key === 'branch' ? 'fail' : 'error',
        }))
      : [item('fail', 'failed', 'fail')];
  const items = [
    ...failures,
    item('pass', 'passed', 'pass'),
    // "in error", not "error": beside "6 stopped by an error" (checks) a bare "0 error" read as a contradiction.
    item('error', 'in error', 'error'),
    item('skipped', 'skipped', 'neutral'),
    item('notApplicable', 'not applicable', 'neutral'),
  ];
  const shown = items.filter((o) => all || o.count > 0);
  if (shown.length === 0)
    return (
      <SkText variant="caption" tone="inkFaint">
        no points counted yet
      </SkText>
    );
  return (
    <View style={styles.row} accessibilityLabel={shown.map((o) => o.said).join(', ')}>
      {shown.map((o) => (
        <Text
          key={o.key}
          style={[
            styles.item,
            compact && styles.compact,
            { color: o.count > 0 ? OUTCOME_TONE[o.tone].ink : theme.color.inkFaint },
          ]}
        >
          {o.text}
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
