import { StyleSheet, View } from 'react-native';
import { theme } from '../../../constants/theme';
import { ChipGroup } from '../../ui/chip-group';
import type { FieldRules } from './field-rules';
import { FormTextInput } from '../../ui/form-text-input';
import { RuleLines } from '../../ui/rule-lines';
import type { ToleranceDraft } from './suite-draft';

/** One tolerance: ulps per component or relative error of the whole value. */
export function ToleranceEditor({
  label,
  value,
  onChange,
  rules,
  field,
}: {
  label: string;
  value: ToleranceDraft;
  onChange: (t: ToleranceDraft) => void;
  rules: FieldRules;
  field: string;
}) {
  return (
    <View style={styles.box}>
      <ChipGroup
        label={`${label} measured in`}
        options={[
          { value: 'ulps', text: 'ulps per part' },
          { value: 'relative', text: 'relative error' },
        ]}
        value={value.kind}
        onChange={(kind) => onChange({ ...value, kind })}
      />
      <FormTextInput
        label={`${label} tolerance`}
        visibleLabel={value.kind === 'ulps' ? 'At most (ulps)' : 'At most (relative)'}
        value={value.value}
        onChangeText={(v) => onChange({ ...value, value: v })}
        rules={rules(`${field}.${value.kind}`)}
        mono
      />
      <RuleLines rules={rules(field).map((r) => `${label} tolerance ${r}`)} />
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(2) },
});
