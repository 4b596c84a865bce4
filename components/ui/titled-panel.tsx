import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import { SkText } from './sk-text';
import { PANEL_BOX_STYLE } from './panel-box-style';

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
      <SkText variant="heading" accessibilityRole="header" aria-level={2}>
        {title}
      </SkText>
      {lead ? (
        <SkText variant="caption" style={styles.lead}>
          {lead}
        </SkText>
      ) : null}
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  panel: {
    ...PANEL_BOX_STYLE,
    gap: theme.space(3),
  },
  lead: { lineHeight: 20 },
});
