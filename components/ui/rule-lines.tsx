import { StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';

/** The rules a field breaks, right under it, each with a glyph so the danger colour is never alone. */
export function RuleLines({ rules, testID }: { rules: string[]; testID?: string }) {
  if (rules.length === 0) return null;
  return (
    <View style={styles.box} testID={testID}>
      {rules.map((rule, i) => (
        <Text key={i} accessibilityRole="alert" style={styles.rule}>
          × {rule}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: 2 },
  rule: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.danger, lineHeight: 18 },
});
