import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { theme } from '../constants/theme';

/** A titled group of the suite form. */
export function FormSection({ title, lead, children, testID }: { title: string; lead?: string; children: ReactNode; testID?: string }) {
  return (
    <View style={styles.section} testID={testID}>
      <Text accessibilityRole="header" aria-level={2} style={styles.title}>
        {title}
      </Text>
      {lead ? <Text style={styles.lead}>{lead}</Text> : null}
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { backgroundColor: theme.color.panel, borderWidth: 1, borderColor: theme.color.rule, borderRadius: theme.radius, padding: theme.space(4), gap: theme.space(3) },
  title: { fontFamily: theme.font.bold, fontSize: theme.size.large, color: theme.color.ink },
  lead: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.inkSoft, lineHeight: 20 },
});
