import { StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import { SkText } from '../ui/sk-text';

/**
 * A run's progress: a bar and the words "n of m checks" (the bar alone would say nothing to a
 * screen reader or in grey print). `label` names what is counted; a run counts checks, each suite
 * against one library version, the word every run screen uses ("shard" is the queue's word).
 */
export function ProgressBar({ done, total, label = 'checks' }: { done: number; total: number; label?: string }) {
  const fraction = total > 0 ? Math.min(1, Math.max(0, done / total)) : 0;
  const words = `${done.toLocaleString('en-GB')} of ${total.toLocaleString('en-GB')} ${label}`;
  return (
    <View style={styles.box}>
      <View
        role="progressbar"
        aria-valuemin={0}
        aria-valuemax={total}
        aria-valuenow={done}
        aria-valuetext={words}
        aria-label={`Progress: ${words}`}
        style={styles.track}
      >
        <View testID="progress-fill" style={[styles.fill, { width: `${fraction * 100}%` }]} />
      </View>
      <SkText variant="mono" tone="inkSoft">
        {words} · {Math.floor(fraction * 100)}%
      </SkText>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(1) },
  track: { height: 10, borderRadius: 5, backgroundColor: theme.color.rule, overflow: 'hidden' },
  fill: { height: '100%', backgroundColor: theme.color.accent, borderRadius: 5 },
});
