import { useState } from 'react';
import { Platform, StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';
import { ActionButton } from '../ui/action-button';

/**
 * A freshly made token's secret, shown this once: the server keeps only its hash, so once this
 * panel is closed (or the page left) nobody can show it again.
 */
export function NewTokenSecret({ name, secret, onDismiss }: { name: string; secret: string; onDismiss: () => void }) {
  const [copied, setCopied] = useState<'yes' | 'failed' | null>(null);
  const clipboard = Platform.OS === 'web' && typeof navigator !== 'undefined' ? navigator.clipboard : undefined;
  const copy = () => {
    if (!clipboard) return setCopied('failed');
    clipboard.writeText(secret).then(
      () => setCopied('yes'),
      () => setCopied('failed'),
    );
  };
  return (
    <View style={styles.box} testID="new-token-secret" accessibilityLiveRegion="polite">
      <Text style={styles.title}>✓ Token “{name}” made</Text>
      <Text style={styles.warning}>Copy it now: you will not see this again. Sheetkeeper keeps only a hash of it.</Text>
      <Text
        selectable
        style={styles.secret}
        testID="new-token-secret-value"
        accessibilityLabel="The new token's secret"
      >
        {secret}
      </Text>
      <View style={styles.buttons}>
        <ActionButton
          label={copied === 'yes' ? '✓ Copied' : 'Copy'}
          accessibilityLabel="Copy the token"
          onPress={copy}
        />
        <ActionButton label="I have stored it" tone="quiet" onPress={onDismiss} />
      </View>
      {copied === 'failed' ? (
        <Text style={styles.note}>This browser did not allow copying: select the text above and copy it by hand.</Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    gap: theme.space(3),
    padding: theme.space(4),
    borderRadius: theme.radius,
    borderWidth: 2,
    borderColor: theme.color.focus,
    backgroundColor: '#FBF3E2',
  },
  title: { fontFamily: theme.font.bold, fontSize: theme.size.body, color: theme.color.ink },
  warning: { fontFamily: theme.font.medium, fontSize: theme.size.body, color: theme.color.ink, lineHeight: 22 },
  secret: {
    fontFamily: theme.font.mono,
    fontSize: theme.size.small,
    color: theme.color.ink,
    backgroundColor: theme.color.panel,
    padding: theme.space(3),
    borderRadius: theme.radius,
    borderWidth: 1,
    borderColor: theme.color.rule,
    wordBreak: 'break-all',
  } as object,
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2) },
  note: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.inkSoft },
});
