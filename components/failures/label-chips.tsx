import { StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import { describeLabel } from '../../shared/describe-label';
import type { Diagnosis } from '../../shared/diagnosis';
import { DiagnosisLabel } from './diagnosis-label';

/**
 * Every label of a failing point as chips, the leading one first (branch labels come before
 * accuracy ones in `labels` already), wrapping on a phone. `details`: each chip with its numbers.
 */
export function LabelChips({ labels, details = false }: { labels: readonly Diagnosis[]; details?: boolean }) {
  return (
    <View style={styles.row}>
      {labels.map((l, i) => (
        <DiagnosisLabel
          key={`${l.kind}-${i}`}
          tone={l.kind}
          detail={details ? describeLabel(l, 'short') || undefined : undefined}
        />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(1) },
});
