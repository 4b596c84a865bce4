import { Link } from 'expo-router';
import type { ComponentProps, ReactNode } from 'react';
import { Pressable, StyleSheet, type StyleProp, type ViewStyle } from 'react-native';
import { theme } from '../../constants/theme';
import { PANEL_BOX_STYLE } from './panel-box-style';

/** A card in a list that is one link as a whole: a ruled panel box, at least a touch target tall. */
export function LinkCard({
  href,
  accessibilityLabel,
  testID,
  style,
  children,
}: {
  href: ComponentProps<typeof Link>['href'];
  accessibilityLabel: string;
  testID?: string;
  /** Additions to the card, e.g. how it grows in a grid. */
  style?: StyleProp<ViewStyle>;
  children: ReactNode;
}) {
  return (
    <Link href={href} asChild>
      <Pressable
        accessibilityRole="link"
        accessibilityLabel={accessibilityLabel}
        style={StyleSheet.flatten([styles.card, style])}
        testID={testID}
      >
        {children}
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  card: {
    ...PANEL_BOX_STYLE,
    gap: theme.space(2),
    minHeight: theme.touch,
  },
});
