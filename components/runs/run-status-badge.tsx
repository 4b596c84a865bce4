import { StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { RunView } from '../../shared/run-view';
import { SkText } from '../ui/sk-text';
import { TagPill } from '../ui/tag-pill';
import { OUTCOME_TONE } from './outcome-tone';
import { runVerdict } from './run-verdict';

/**
 * A run's verdict as glyph, words and colour together, so it reads without the colour, and under
 * it in words the checks that failed with every point passed and the checks stopped by an error:
 * the same on every screen that shows a run.
 */
export function RunStatusBadge({
  run,
}: {
  run: Pick<RunView, 'status' | 'counts' | 'checksStopped' | 'checksFailed'>;
}) {
  const verdict = runVerdict(run);
  const tone = OUTCOME_TONE[verdict.tone];
  return (
    <View style={styles.badge}>
      <TagPill
        text={`${verdict.glyph} ${verdict.word}`}
        ink={tone.ink}
        soft={tone.soft}
        edge={tone.edge}
        accessibilityLabel={`status: ${verdict.word}`}
      />
      {verdict.beyondPoints ? (
        <SkText variant="caption" tone="ink" testID="run-checks-beyond-points">
          {verdict.beyondPoints}
        </SkText>
      ) : null}
      {verdict.stopped ? (
        <SkText variant="caption" tone="ink" testID="run-checks-stopped">
          {verdict.stopped}
        </SkText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  badge: { alignItems: 'flex-start', gap: theme.space(1) },
});
