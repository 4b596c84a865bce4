import { StyleSheet, View } from 'react-native';
import { theme } from '../../../constants/theme';
import type { ItemEditorProps } from './item-editor-props';
import { FormTextInput } from '../../ui/form-text-input';
import { EditorItem } from './editor-item';
import type { CounterpartDraft } from './suite-draft';

/** One counterpart: another subject, another entry of the target, or both, that must agree with the suite's subject. */
export function CounterpartEditor({ value, index, onChange, onRemove, rules }: ItemEditorProps<CounterpartDraft>) {
  const f = `counterparts.${index}`;
  const n = `Counterpart ${index + 1}`;
  return (
    <EditorItem
      title={n}
      removeText="Remove counterpart"
      removeLabel={`Remove counterpart ${index + 1}`}
      onRemove={onRemove}
      rules={rules(f)}
    >
      <View style={styles.row}>
        <FormTextInput
          label={`${n} subject`}
          visibleLabel="Subject"
          hint="blank for the suite's own subject, e.g. z^(1/2) beside sqrt(z)"
          value={value.subject}
          onChangeText={(subject) => onChange({ ...value, subject })}
          rules={rules(`${f}.subject`)}
          mono
        />
        <FormTextInput
          label={`${n} entry`}
          visibleLabel="Entry"
          hint="blank for the target's default way of building numbers"
          value={value.entry}
          onChangeText={(entry) => onChange({ ...value, entry })}
          rules={rules(`${f}.entry`)}
          mono
        />
      </View>
    </EditorItem>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(3) },
});
