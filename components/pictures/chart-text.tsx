import type { ComponentProps } from 'react';
import { Text as SvgText } from 'react-native-svg';
import { theme } from '../../constants/theme';
import { formulaSpeech } from '../ui/formula-speech';

/**
 * Text inside a chart, in the app's own font: an SVG text element without a family falls back
 * to the browser's default, a serif unlike every other word of the app. Size 11 and the faint
 * ink unless told otherwise. A label with maths in it ("−π/2", "1e−300") is named by its spoken
 * form ("minus pi over 2", formula-speech.ts), as FormulaText is; the picture's own label, which
 * is what a screen reader reads of an image, says the same words.
 */
export function ChartText({
  fontSize = 11,
  fill = theme.color.inkSoft,
  children,
  ...rest
}: ComponentProps<typeof SvgText>) {
  const spoken = typeof children === 'string' ? formulaSpeech(children) : null;
  return (
    <SvgText
      fontFamily={theme.font.regular}
      fontSize={fontSize}
      fill={fill}
      aria-label={spoken !== null && spoken !== children ? spoken : undefined}
      {...rest}
    >
      {children}
    </SvgText>
  );
}
