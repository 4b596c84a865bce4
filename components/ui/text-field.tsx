import { StyleSheet, TextInput, View, type TextInputProps } from 'react-native';
import { theme } from '../../constants/theme';
import { INPUT_BOX_STYLE } from './input-box-style';
import { RuleLines } from './rule-lines';
import { SkText } from './sk-text';

interface Props extends Pick<
  TextInputProps,
  | 'secureTextEntry'
  | 'autoComplete'
  | 'keyboardType'
  | 'onSubmitEditing'
  | 'autoCapitalize'
  | 'multiline'
  | 'placeholder'
> {
  label: string;
  value: string;
  onChangeText: (text: string) => void;
  /** The broken rule, shown under the field and announced to screen readers. */
  error?: string;
  testID?: string;
  /** Monospaced input, for expressions and identifiers. */
  mono?: boolean;
}

export function TextField({ label, value, onChangeText, error, testID, mono = false, ...inputProps }: Props) {
  return (
    <View style={styles.field}>
      <SkText variant="smallLabel" style={styles.label}>
        {label}
      </SkText>
      <TextInput
        accessibilityLabel={label}
        aria-invalid={error ? true : undefined}
        value={value}
        onChangeText={onChangeText}
        style={[
          styles.input,
          mono ? styles.mono : null,
          inputProps.multiline ? styles.multiline : null,
          error ? styles.inputError : null,
        ]}
        testID={testID}
        autoCorrect={false}
        placeholderTextColor={theme.color.inkFaint}
        {...inputProps}
      />
      <RuleLines rules={error ? [`${label} ${error}`] : []} />
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: theme.space(1) },
  label: { letterSpacing: 0.3 },
  input: {
    ...INPUT_BOX_STYLE,
  },
  mono: { fontFamily: theme.font.mono },
  multiline: { minHeight: 96, paddingVertical: theme.space(2), textAlignVertical: 'top' },
  inputError: { borderColor: theme.color.danger, borderWidth: 2 },
});
