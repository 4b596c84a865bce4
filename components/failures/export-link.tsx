import { StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';
import { SkText } from '../ui/sk-text';

/**
 * A download link to a file the server makes (the CSV export). On the web, react-native-web
 * renders a Text with `href` as an anchor, so the browser downloads it as any link; when the
 * export is not possible yet, the reason stands in its place.
 */
export function ExportLink({ href, label, disabledReason }: { href: string; label: string; disabledReason?: string }) {
  if (disabledReason) {
    return (
      <View style={[styles.link, styles.off]} aria-disabled>
        <SkText variant="label" tone="inkFaint">
          {label}
        </SkText>
        <Text style={styles.reason}>{disabledReason}</Text>
      </View>
    );
  }
  // `href` and `hrefAttrs` are react-native-web props its types do not list.
  const anchor = { href, hrefAttrs: { download: 'sheetkeeper-failures.csv', rel: 'noopener' } } as object;
  return (
    <Text accessibilityRole="link" accessibilityLabel={label} style={styles.link} {...anchor}>
      {label}
    </Text>
  );
}

const styles = StyleSheet.create({
  link: {
    minHeight: theme.touch,
    paddingHorizontal: theme.space(4),
    borderWidth: 1,
    borderColor: theme.color.accent,
    borderRadius: theme.radius,
    fontFamily: theme.font.medium,
    fontSize: theme.size.body,
    color: theme.color.accent,
    textAlignVertical: 'center',
    lineHeight: theme.touch - 2,
    alignSelf: 'flex-start',
    textDecorationLine: 'none',
  },
  off: {
    borderColor: theme.color.control,
    justifyContent: 'center',
    paddingVertical: theme.space(1),
    lineHeight: undefined,
  },
  reason: { fontFamily: theme.font.regular, fontSize: 12, color: theme.color.inkFaint },
});
