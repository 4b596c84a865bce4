import { StyleSheet, Text } from 'react-native';
import { theme } from '../constants/theme';
import type { RunView } from '../shared/run-view';
import { OUTCOME_TONE } from './outcome-tone';
import { runVerdict } from './run-verdict';

/** A run's state as glyph, words and colour together, so it reads without the colour. */
export function RunStatusBadge({ run }: { run: Pick<RunView, 'status' | 'counts'> }) {
  const verdict = runVerdict(run);
  const tone = OUTCOME_TONE[verdict.tone];
  return (
    <Text style={[styles.badge, { color: tone.ink, backgroundColor: tone.soft, borderColor: tone.edge }]} accessibilityLabel={`status: ${verdict.word}`}>
      {verdict.glyph} {verdict.word}
    </Text>
  );
}

const styles = StyleSheet.create({
  badge: {
    alignSelf: 'flex-start',
    fontFamily: theme.font.medium,
    fontSize: theme.size.small,
    paddingHorizontal: theme.space(2),
    paddingVertical: 2,
    borderRadius: theme.radius,
    borderWidth: 1,
    overflow: 'hidden',
  },
});
