import { StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { Diagnosis } from '../../shared/diagnosis';
import { formatComplexText } from '../../shared/format-complex-text';
import type { WireComplex } from '../../shared/wire-complex';
import { SkText } from '../ui/sk-text';

/**
 * An agreement check that failed: this subject's value, the other subject's or entry's value at
 * the same input, and the reference, with which of the two left it, so a reader sees at once
 * whether one of them is right.
 */
export function DisagreementValues({
  label: d,
  subject,
  actual,
  expected,
}: {
  label: Extract<Diagnosis, { kind: 'disagreement' }>;
  subject: string;
  actual: WireComplex | null;
  expected: WireComplex | null;
}) {
  const rows = [
    { name: subject, value: actual },
    { name: d.with, value: d.other },
    { name: 'reference', value: expected },
  ];
  return (
    <View style={styles.root} testID="disagreement">
      <SkText variant="body">
        The same library gives two values here, through {subject} and through {d.with}.{' '}
        {d.otherMatchesReference
          ? `The value through ${d.with} matches the reference; this one does not.`
          : 'Neither matches the reference.'}
      </SkText>
      {rows.map((r) => (
        <View key={r.name} style={styles.row}>
          <Text style={styles.name}>{r.name}</Text>
          <Text style={styles.value} selectable>
            {formatComplexText(r.value)}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: theme.space(2) },
  row: { gap: 2, borderBottomWidth: 1, borderBottomColor: theme.color.rule, paddingBottom: theme.space(2) },
  name: { fontFamily: theme.font.medium, fontSize: 12, color: theme.color.inkFaint, letterSpacing: 0.6 },
  value: { fontFamily: theme.font.mono, fontSize: 15, color: theme.color.ink },
});
