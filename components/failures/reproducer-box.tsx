import { useState } from 'react';
import { Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';

/** The reproducer as code to paste, with a copy button that says whether the copy worked. */
export function ReproducerBox({ code }: { code: string }) {
  const [copied, setCopied] = useState<'yes' | 'no' | null>(null);
  const copy = async () => {
    try {
      await navigator.clipboard.writeText(code);
      setCopied('yes');
    } catch {
      // No clipboard (an insecure origin, or permission refused): the code stays selectable.
      setCopied('no');
    }
  };
  return (
    <View style={styles.root}>
      <ScrollView horizontal style={styles.box} contentContainerStyle={styles.inner}>
        <Text style={styles.code} selectable accessibilityLabel="Reproducer code">
          {code}
        </Text>
      </ScrollView>
      <View style={styles.row}>
        <Pressable
          accessibilityRole="button"
          accessibilityLabel="Copy reproducer"
          onPress={() => void copy()}
          style={styles.button}
        >
          <Text style={styles.buttonText}>Copy reproducer</Text>
        </Pressable>
        {copied ? (
          <Text style={copied === 'yes' ? styles.ok : styles.failed} accessibilityLiveRegion="polite">
            {copied === 'yes' ? '✓ Copied' : '× Could not copy here: select the code instead'}
          </Text>
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: theme.space(2) },
  box: { backgroundColor: theme.color.nav, borderRadius: theme.radius, maxHeight: 320 },
  inner: { padding: theme.space(3) },
  code: { fontFamily: theme.font.mono, fontSize: 13, lineHeight: 19, color: theme.color.navInk },
  row: { flexDirection: 'row', alignItems: 'center', gap: theme.space(3), flexWrap: 'wrap' },
  button: {
    minHeight: theme.touch,
    justifyContent: 'center',
    paddingHorizontal: theme.space(4),
    borderWidth: 1,
    borderColor: theme.color.accent,
    borderRadius: theme.radius,
  },
  buttonText: { fontFamily: theme.font.medium, fontSize: theme.size.body, color: theme.color.accent },
  ok: { fontFamily: theme.font.medium, fontSize: theme.size.small, color: theme.color.accent },
  failed: { fontFamily: theme.font.medium, fontSize: theme.size.small, color: theme.color.danger },
});
