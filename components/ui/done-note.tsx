import { StyleSheet, Text } from 'react-native';
import { theme } from '../../constants/theme';

/** What was just done, on an accent strip that assistive tech reads out politely: "✓ Recorded: …", "✓ Revoked: …". */
export function DoneNote({ text }: { text: string }) {
  return (
    <Text style={styles.done} accessibilityLiveRegion="polite">
      {text}
    </Text>
  );
}

const styles = StyleSheet.create({
  done: {
    fontFamily: theme.font.medium,
    color: theme.color.accent,
    backgroundColor: theme.color.accentSoft,
    padding: theme.space(3),
    borderRadius: theme.radius,
  },
});
