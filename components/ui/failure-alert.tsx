import { StyleSheet, Text, type StyleProp, type TextStyle } from 'react-native';
import { theme } from '../../constants/theme';

/** What the server refused, on a tinted strip that assistive tech announces as soon as it appears. */
export function FailureAlert({
  message,
  glyph = '❌',
  style,
}: {
  message: string;
  /** The mark before the words; the users list writes a plain ×. */
  glyph?: string;
  /** Additions to the strip, e.g. a margin under it. */
  style?: StyleProp<TextStyle>;
}) {
  return (
    <Text accessibilityRole="alert" style={[styles.failure, style]}>
      {glyph} {message}
    </Text>
  );
}

const styles = StyleSheet.create({
  failure: {
    fontFamily: theme.font.medium,
    color: theme.color.danger,
    backgroundColor: theme.color.dangerSoft,
    padding: theme.space(3),
    borderRadius: theme.radius,
  },
});
