import { StyleSheet, Text } from 'react-native';
import { theme } from '../../constants/theme';

/**
 * Outside the web there is no sandboxed frame to put a stranger's HTML in, and no HTML renderer is
 * installed, so native builds say so and the plain-text part is the way to read the message.
 */
export function MailHtmlFrame(_props: { html: string; title: string }) {
  return (
    <Text style={styles.note}>
      The HTML part is shown in the web app only; switch to the plain text to read this message here.
    </Text>
  );
}

const styles = StyleSheet.create({
  note: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.inkSoft },
});
