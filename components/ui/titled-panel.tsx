import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';

/** A panel with a heading and an optional line saying what it is for. */
export function TitledPanel({
  title,
  lead,
  children,
  testID,
}: {
  title: string;
  lead?: string;
  children: ReactNode;
  testID?: string;
}) {
  return (
    <View style={styles.panel} testID={testID}>
      <Text accessibilityRole="header" aria-level={2} style={styles.title}>
        {title}
      </Text>
      {lead ? <Text style={styles.lead}>{lead}</Text> : null}
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  panel: {
    backgroundColor: theme.color.panel,
    borderWidth: 1,
    borderColor: theme.color.rule,
    borderRadius: theme.radius,
    padding: theme.space(4),
    gap: theme.space(3),
  },
  title: { fontFamily: theme.font.bold, fontSize: theme.size.large, color: theme.color.ink },
  lead: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.inkSoft, lineHeight: 20 },
});
