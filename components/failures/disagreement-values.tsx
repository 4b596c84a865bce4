import { StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { Diagnosis } from '../../shared/diagnosis';
import { ValueRow } from './value-row';
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
        <ValueRow key={r.name} name={r.name} value={r.value} code={r.name === d.with} />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: theme.space(2) },
});
