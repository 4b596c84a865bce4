import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';

/** The scrolling body of a screen: a title, an optional lead line, the content. */
export function ScreenBody({ title, lead, children }: { title: string; lead?: string; children: ReactNode }) {
  return (
    <ScrollView style={styles.scroll} contentContainerStyle={styles.content}>
      <View style={styles.column}>
        <Text accessibilityRole="header" style={styles.title}>
          {title}
        </Text>
        {lead ? <Text style={styles.lead}>{lead}</Text> : null}
        {children}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: theme.color.paper },
  content: { padding: theme.space(4), paddingBottom: theme.space(10) },
  column: { width: '100%', maxWidth: 1100, alignSelf: 'center', gap: theme.space(4) },
  title: { fontFamily: theme.font.bold, fontSize: theme.size.title, color: theme.color.ink },
  lead: { fontFamily: theme.font.regular, fontSize: theme.size.body, color: theme.color.inkSoft, lineHeight: 24 },
});
