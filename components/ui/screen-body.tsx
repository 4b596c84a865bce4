import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import { PageTitle } from './page-title';
import { SkText } from './sk-text';

/**
 * The scrolling body of a screen: a title, an optional lead line, the content. The title also
 * names the browser tab, unless `pageTitle` says it otherwise (a plan's page is "Plan <name>").
 */
export function ScreenBody({
  title,
  pageTitle,
  lead,
  children,
}: {
  title: string;
  pageTitle?: string;
  lead?: string;
  children: ReactNode;
}) {
  return (
    <ScrollView style={styles.scroll} contentContainerStyle={styles.content}>
      <PageTitle title={pageTitle ?? title} />
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
