import { StyleSheet, Text } from 'react-native';
import { theme } from '../../constants/theme';

/**
 * A small rounded label for a state or a role: a glyph and a word in one colour on a soft ground
 * (with an edge when given), so it reads without the colour. The badges of runs, suites and roles
 * are each one of these.
 */
export function TagPill({
  text,
  ink,
  soft,
  edge,
  accessibilityLabel,
}: {
  text: string;
  ink: string;
  soft: string;
  edge?: string;
  accessibilityLabel: string;
}) {
  return (
    <Text
      style={[styles.pill, { color: ink, backgroundColor: soft }, edge ? { borderColor: edge, borderWidth: 1 } : null]}
      accessibilityLabel={accessibilityLabel}
    >
      {text}
    </Text>
  );
}

const styles = StyleSheet.create({
  pill: {
    alignSelf: 'flex-start',
    fontFamily: theme.font.medium,
    fontSize: theme.size.small,
    paddingHorizontal: theme.space(2),
    paddingVertical: 2,
    borderRadius: theme.radius,
    overflow: 'hidden',
  },
});
