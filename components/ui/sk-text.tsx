import { StyleSheet, Text, type TextProps } from 'react-native';
import { theme } from '../../constants/theme';
import { textVariants } from './text-variants';

type Tone = keyof typeof theme.color;

/** One colour style per theme colour, so a tone is a registered style like the variants. */
const tones = StyleSheet.create(
  Object.fromEntries(Object.entries(theme.color).map(([tone, color]) => [tone, { color }])) as Record<
    Tone,
    { color: string }
  >,
);

/**
 * Text in one of the app's text styles (`textVariants`). `tone` replaces the variant's colour with
 * another of the theme's; `style` adds to it (margins, line height, weight) and wins where both set
 * the same property, as a later style in a list does.
 */
export function SkText({
  variant,
  tone,
  style,
  ...rest
}: TextProps & { variant: keyof typeof textVariants; tone?: Tone }) {
  return <Text {...rest} style={[textVariants[variant], tone ? tones[tone] : null, style]} />;
}
