import { StyleSheet, TextInput, View } from 'react-native';
import { theme } from '../../constants/theme';
import { INPUT_BOX_STYLE } from './input-box-style';
import { RuleLines } from './rule-lines';
import { SkText } from './sk-text';

interface Props {
  label: string;
  value: string;
  onChangeText: (text: string) => void;
  /** The rules this field breaks, shown beside it (under it on a phone). */
  rules?: string[];
  hint?: string;
  mono?: boolean;
  multiline?: boolean;
  /** Shown inline but kept out of the accessible name when the label repeats context (e.g. "re"). */
  visibleLabel?: string;
  testID?: string;
}

/** A labelled text input of the suite form; what was typed is kept exactly as typed. */
export function FormTextInput({
  label,
  value,
  onChangeText,
  rules = [],
  hint,
  mono = false,
  multiline = false,
  visibleLabel,
  testID,
}: Props) {
  return (
    <View style={styles.field}>
      <SkText variant="smallLabel">{visibleLabel ?? label}</SkText>
      <TextInput
        accessibilityLabel={label}
        aria-invalid={rules.length > 0 ? true : undefined}
        value={value}
        onChangeText={onChangeText}
        multiline={multiline}
        autoCorrect={false}
        autoCapitalize="none"
        style={[styles.input, mono && styles.mono, multiline && styles.multiline, rules.length > 0 && styles.invalid]}
        testID={testID}
      />
      {hint ? (
        <SkText variant="caption" tone="inkFaint">
          {hint}
        </SkText>
      ) : null}
      <RuleLines rules={rules.map((r) => `${visibleLabel ?? label} ${r}`)} />
    </View>
  );
}

const styles = StyleSheet.create({
  // No flexBasis: in a column it would become a height. In a wrapping row, fields grow to share it.
  field: { gap: theme.space(1), flexGrow: 1, minWidth: 100 },
  input: {
    ...INPUT_BOX_STYLE,
    minWidth: 0,
  },
  mono: { fontFamily: theme.font.mono },
  multiline: { minHeight: 88, paddingVertical: theme.space(2), textAlignVertical: 'top' },
  invalid: { borderColor: theme.color.danger, borderWidth: 2 },
});
