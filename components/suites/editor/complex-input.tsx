import { StyleSheet, View } from 'react-native';
import { theme } from '../../../constants/theme';
import { FormTextInput } from '../../ui/form-text-input';
import { RuleLines } from '../../ui/rule-lines';
import { SkText } from '../../ui/sk-text';
import type { ComplexDraft } from './suite-draft';

interface Props {
  label: string;
  value: ComplexDraft;
  onChange: (value: ComplexDraft) => void;
  /** Rules on the number as a whole, then on each part. */
  rules: { whole: string[]; re: string[]; im: string[] };
}

/** A complex number as two number strings (decimal, p/q, hex float, "-0"), side by side. */
export function ComplexInput({ label, value, onChange, rules }: Props) {
  return (
    <View style={styles.box}>
      <SkText variant="smallLabel" tone="ink">
        {label}
      </SkText>
      <View style={styles.row}>
        <View style={styles.part}>
          <FormTextInput
            label={`${label}, real part`}
            visibleLabel="re"
            value={value.re}
            onChangeText={(re) => onChange({ ...value, re })}
            rules={rules.re}
            mono
          />
        </View>
        <View style={styles.part}>
          <FormTextInput
            label={`${label}, imaginary part`}
            visibleLabel="im"
            value={value.im}
            onChangeText={(im) => onChange({ ...value, im })}
            rules={rules.im}
            mono
          />
        </View>
      </View>
      <RuleLines rules={rules.whole.map((r) => `${label} ${r}`)} />
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(1), flexGrow: 1, flexShrink: 1, minWidth: 200 },
  row: { flexDirection: 'row', gap: theme.space(2) },
  part: { flex: 1, minWidth: 0 },
});
