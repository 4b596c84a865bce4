import { StyleSheet, View } from 'react-native';
import { theme } from '../../../constants/theme';
import { ChipGroup } from '../../ui/chip-group';
import type { FieldRules } from './field-rules';
import { FormTextInput } from '../../ui/form-text-input';
import { RuleLines } from '../../ui/rule-lines';
import type { ToleranceDraft } from './suite-draft';

/** One tolerance: ulps per component, relative error of the whole value, or either bound (a value within one passes). */
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
          { value: 'either', text: 'either bound' },
        ]}
        value={value.kind}
        onChange={(kind) => onChange({ ...value, kind })}
      />
      <FormTextInput
        label={`${label} tolerance`}
        visibleLabel={value.kind === 'relative' ? 'At most (relative)' : 'At most (ulps per part)'}
        value={value.value}
        onChangeText={(v) => onChange({ ...value, value: v })}
        rules={rules(`${field}.${value.kind === 'either' ? 'ulps' : value.kind}`)}
        mono
      />
      {value.kind === 'either' ? (
        <FormTextInput
          label={`${label} relative tolerance`}
          visibleLabel="Or at most (relative)"
          value={value.relative ?? ''}
          onChangeText={(v) => onChange({ ...value, relative: v })}
          rules={rules(`${field}.relative`)}
          mono
        />
      ) : null}
      <RuleLines rules={rules(field).map((r) => `${label} tolerance ${r}`)} />
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(2) },
});
