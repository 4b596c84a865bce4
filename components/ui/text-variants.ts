import { StyleSheet } from 'react-native';
import { theme } from '../../constants/theme';

/**
 * The app's text styles, each declared once from the theme's families, sizes and inks. A variant
 * fixes the family and the size; its colour is the usual one and `SkText`'s `tone` picks another.
 * Text boxes spread `body` into their own style (a TextInput is not an `SkText`).
 * Counted when these were made: 295 style objects in components/ and app/ wrote a family, a size
 * and a colour inline, and these nine (family, size) pairs covered 261 of them. The 38 left are
 * written where they are used: sizes off the theme's scale (11, 12, 14, 15, 18, 20 px), pairs used
 * once, and styles given to a link or passed on to another component rather than to a Text.
 */
export const textVariants = StyleSheet.create({
  /** Running text. */
  body: { fontFamily: theme.font.regular, fontSize: theme.size.body, color: theme.color.ink },
  /** A control's or a field's words, a row's name. */
  label: { fontFamily: theme.font.medium, fontSize: theme.size.body, color: theme.color.ink },
  /** A word that must stand out inside running text. */
  strong: { fontFamily: theme.font.bold, fontSize: theme.size.body, color: theme.color.ink },
  /** A panel's or a section's heading. */
  heading: { fontFamily: theme.font.bold, fontSize: theme.size.large, color: theme.color.ink },
  /** A screen's title. */
  title: { fontFamily: theme.font.bold, fontSize: theme.size.title, color: theme.color.ink },
  /** Notes, hints and secondary facts. */
  caption: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.inkSoft },
  /** Small labels: column heads, field names, small buttons. */
  smallLabel: { fontFamily: theme.font.medium, fontSize: theme.size.small, color: theme.color.inkSoft },
  /** Values the reader may copy or compare digit by digit: numbers, names, fingerprints. */
  mono: { fontFamily: theme.font.mono, fontSize: theme.size.small, color: theme.color.ink },
  /** A mono value at the body's size. */
  monoBody: { fontFamily: theme.font.mono, fontSize: theme.size.body, color: theme.color.ink },
});
