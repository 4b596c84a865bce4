import { StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import { FormulaText } from './formula-text';
import { SkText } from './sk-text';

/**
 * The rules a field breaks, right under it, each with a glyph so the danger colour is never alone.
 * A rule may carry maths (a cut layout's e^{2πi·2/3}): its exponents are raised, and every other
 * character is left as written, since a rule may quote what was typed.
 */
export function RuleLines({ rules, testID }: { rules: string[]; testID?: string }) {
  if (rules.length === 0) return null;
  return (
    <View style={styles.box} testID={testID}>
      {rules.map((rule, i) => (
        <SkText variant="caption" tone="danger" key={i} accessibilityRole="alert" style={styles.rule}>
          × <FormulaText text={rule} size={theme.size.small} variables={false} />
        </SkText>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: 2 },
  rule: { lineHeight: 18 },
});
