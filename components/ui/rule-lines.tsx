import { StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import { FormulaText } from './formula-text';
import { SkText } from './sk-text';

/**
 * The rules a field breaks, right under it, each with a glyph so the danger colour is never alone.
 * A rule may carry maths (a cut layout's e^{2πi·2/3}): it is set as a formula.
 */
export function RuleLines({ rules, testID }: { rules: string[]; testID?: string }) {
  if (rules.length === 0) return null;
  return (
    <View style={styles.box} testID={testID}>
      {rules.map((rule, i) => (
        <SkText variant="caption" tone="danger" key={i} accessibilityRole="alert" style={styles.rule}>
          × <FormulaText text={rule} size={theme.size.small} />
        </SkText>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: 2 },
  rule: { lineHeight: 18 },
});
