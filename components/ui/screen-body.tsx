import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import { SkText } from './sk-text';

/** The scrolling body of a screen: a title, an optional lead line, the content. */
export function ScreenBody({ title, lead, children }: { title: string; lead?: string; children: ReactNode }) {
  return (
    <ScrollView style={styles.scroll} contentContainerStyle={styles.content}>
      <View style={styles.column}>
        <SkText variant="title" accessibilityRole="header">
          {title}
        </SkText>
        {lead ? (
          <SkText variant="body" tone="inkSoft" style={styles.lead}>
            {lead}
          </SkText>
        ) : null}
        {children}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: theme.color.paper },
  content: { padding: theme.space(4), paddingBottom: theme.space(10) },
  column: { width: '100%', maxWidth: 1100, alignSelf: 'center', gap: theme.space(4) },
  lead: { lineHeight: 24 },
});
