import { useRef } from 'react';
import { StyleSheet, TextInput, View, type TextInputProps } from 'react-native';
import { carriedFocus } from './carried-focus';
import { useMountFocus } from './use-mount-focus';
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
  /** Submitting (Enter) mounts a new screen with this field on it, which then takes the focus (`carriedFocus`). */
  carriesFocus?: boolean;
}

export function TextField({
  label,
  value,
  onChangeText,
  error,
  testID,
  mono = false,
  carriesFocus = false,
  onSubmitEditing,
  ...inputProps
}: Props) {
  const input = useRef<TextInput>(null);
  useMountFocus(() => (carriesFocus && carriedFocus.take(label) ? input.current : null));
  return (
    <View style={styles.field}>
      <SkText variant="smallLabel" style={styles.label}>
        {label}
      </SkText>
      <TextInput
        ref={input}
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
        onSubmitEditing={
          onSubmitEditing &&
          ((event) => {
            if (carriesFocus) carriedFocus.carry(label);
            onSubmitEditing(event);
          })
        }
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
