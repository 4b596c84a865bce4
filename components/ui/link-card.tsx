import { Link } from 'expo-router';
import type { ComponentProps, ReactNode } from 'react';
import { Pressable, StyleSheet, type StyleProp, type ViewStyle } from 'react-native';
import { theme } from '../../constants/theme';
import { PANEL_BOX_STYLE } from './panel-box-style';

/**
 * A card in a list that is one link as a whole: a ruled panel box, at least a touch target tall.
 * Its name is its words: an aria-label would hide them from the name, and a person who reads the
 * card's title aloud to a speech tool must be able to follow it (WCAG 2.5.3, label in name).
 */
export function LinkCard({
  href,
  testID,
  style,
  children,
}: {
  href: ComponentProps<typeof Link>['href'];
  testID?: string;
  /** Additions to the card, e.g. how it grows in a grid. */
  style?: StyleProp<ViewStyle>;
  children: ReactNode;
}) {
  return (
    <Link href={href} asChild>
      <Pressable accessibilityRole="link" style={StyleSheet.flatten([styles.card, style])} testID={testID}>
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
