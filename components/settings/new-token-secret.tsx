import { useState } from 'react';
import { Platform, StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import { ActionButton } from '../ui/action-button';
import { SkText } from '../ui/sk-text';

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
      <SkText variant="strong">✓ Token “{name}” made</SkText>
      <SkText variant="label" style={styles.warning}>
        Copy it now: you will not see this again. Sheetkeeper keeps only a hash of it.
      </SkText>
      <SkText
        variant="mono"
        selectable
        style={styles.secret}
        testID="new-token-secret-value"
        accessibilityLabel="The new token's secret"
      >
        {secret}
      </SkText>
      <View style={styles.buttons}>
        <ActionButton
          label={copied === 'yes' ? '✓ Copied' : 'Copy'}
          accessibilityLabel="Copy the token"
          onPress={copy}
        />
        <ActionButton label="I have stored it" tone="quiet" onPress={onDismiss} />
      </View>
      {copied === 'failed' ? (
        <SkText variant="caption">
          This browser did not allow copying: select the text above and copy it by hand.
        </SkText>
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
    backgroundColor: theme.color.secretSoft,
  },
  warning: { lineHeight: 22 },
  secret: {
    backgroundColor: theme.color.panel,
    padding: theme.space(3),
    borderRadius: theme.radius,
    borderWidth: 1,
    borderColor: theme.color.rule,
    wordBreak: 'break-all',
  } as object,
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2) },
});
