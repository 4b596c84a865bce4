import { StyleSheet, View } from 'react-native';
import { theme } from '../../../constants/theme';
import { ComplexInput } from './complex-input';
import { complexRules } from './complex-rules';
import type { FieldRules } from './field-rules';
import { SmallButton } from '../../ui/small-button';
import type { ComplexDraft } from './suite-draft';

interface Props {
  /** e.g. "Cut 1 point": each point is labelled "<label> <n>". */
  label: string;
  points: ComplexDraft[];
  onChange: (points: ComplexDraft[]) => void;
  rules: FieldRules;
  /** The body field of the list, e.g. "branch.cuts.0.points". */
  field: string;
}

/** A polyline's or a list's points: each one editable and removable, and one more added after the last. */
export function PointListEditor({ label, points, onChange, rules, field }: Props) {
  const set = (k: number, p: ComplexDraft) => onChange(points.map((q, j) => (j === k ? p : q)));
  return (
    <View style={styles.list}>
      {points.map((p, k) => (
        <View key={k} style={styles.row}>
          <ComplexInput
            label={`${label} ${k + 1}`}
            value={p}
            onChange={(v) => set(k, v)}
            rules={complexRules(rules, `${field}.${k}`)}
          />
          <SmallButton
            label="−"
            accessibilityLabel={`Remove ${label.toLowerCase()} ${k + 1}`}
            onPress={() => onChange(points.filter((_, j) => j !== k))}
            danger
          />
        </View>
      ))}
      <SmallButton
        label="+ Add a point"
        accessibilityLabel={`Add a ${label.toLowerCase()}`}
        onPress={() => {
          const last = points[points.length - 1];
          onChange([...points, last ? { ...last } : { re: '0', im: '0' }]);
        }}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: theme.space(2) },
  row: { flexDirection: 'row', alignItems: 'flex-end', gap: theme.space(2) },
});
