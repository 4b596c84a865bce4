import { useState } from 'react';
import { Pressable, ScrollView, StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import { SkText } from '../ui/sk-text';

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
      {/* A region that takes focus, so a keyboard user can scroll a long line sideways (axe-core's
          scrollable-region-focusable). */}
      <ScrollView
        horizontal
        focusable
        role="region"
        aria-label="Reproducer code"
        style={styles.box}
        contentContainerStyle={styles.inner}
      >
        <SkText variant="mono" tone="navInk" style={styles.code} selectable>
          {code}
        </SkText>
      </ScrollView>
      <View style={styles.row}>
        <Pressable
          accessibilityRole="button"
          accessibilityLabel="Copy reproducer"
          onPress={() => void copy()}
          style={styles.button}
        >
          <SkText variant="label" tone="accent">
            Copy reproducer
          </SkText>
        </Pressable>
        {copied ? (
          <SkText variant="smallLabel" tone={copied === 'yes' ? 'accent' : 'danger'} accessibilityLiveRegion="polite">
            {copied === 'yes' ? '✓ Copied' : '❌ Could not copy here: select the code instead'}
          </SkText>
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: theme.space(2) },
  box: { backgroundColor: theme.color.nav, borderRadius: theme.radius, maxHeight: 320 },
  inner: { padding: theme.space(3) },
  code: { lineHeight: 19 },
  row: { flexDirection: 'row', alignItems: 'center', gap: theme.space(3), flexWrap: 'wrap' },
  button: {
    minHeight: theme.touch,
    justifyContent: 'center',
    paddingHorizontal: theme.space(4),
    borderWidth: 1,
    borderColor: theme.color.accent,
    borderRadius: theme.radius,
  },
});
