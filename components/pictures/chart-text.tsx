import type { ComponentProps } from 'react';
import { Text as SvgText } from 'react-native-svg';
import { theme } from '../../constants/theme';

/**
 * Text inside a chart, in the app's own font: an SVG text element without a family falls back
 * to the browser's default, a serif unlike every other word of the app. Size 11 and the faint
 * ink unless told otherwise.
 */
export function ChartText({ fontSize = 11, fill = theme.color.inkSoft, ...rest }: ComponentProps<typeof SvgText>) {
  return <SvgText fontFamily={theme.font.regular} fontSize={fontSize} fill={fill} {...rest} />;
}
