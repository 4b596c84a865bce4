import { Text, type StyleProp, type TextStyle } from 'react-native';
import { theme } from '../../constants/theme';
import { formulaPieces } from './formula-pieces';

/**
 * A formula (or a sentence with formulas in it) set as maths: exponents raised and smaller,
 * indices lowered, one-letter variables in italics, real minus signs (formula-pieces.ts reads
 * the text). `size` is the surrounding text's size in px, which raised text is set against;
 * nested inside an SkText it takes that text's family and colour. Text with nothing to set
 * apart stays one run of text, as plain text would be.
 */
export function FormulaText({
  text,
  size = theme.size.body,
  variables = true,
  style,
  testID,
}: {
  text: string;
  size?: number;
  /** false: raise exponents only, leaving letters and signs as typed (rules that quote a field's value). */
  variables?: boolean;
  style?: StyleProp<TextStyle>;
  testID?: string;
}) {
  const pieces = formulaPieces(text, { variables });
  if (pieces.every((p) => p.place === 'line' && !p.italic) && !style && !testID)
    return <>{pieces.map((p) => p.text).join('')}</>;
  // 0.72 of the line's size, and never under 9 px, the least IBM Plex stays legible at.
  const fontSize = Math.max(9, Math.round(size * 0.72));
  // On the web a span's vertical-align: top sets it at the top of the line (raised), bottom at its foot.
  const placed: Record<'sup' | 'sub', TextStyle> = {
    sup: { fontSize, verticalAlign: 'top' },
    sub: { fontSize, verticalAlign: 'bottom' },
  };
  return (
    <Text style={style} testID={testID}>
      {pieces.map((p, i) => (
        <Text key={i} style={[p.italic ? { fontStyle: 'italic' } : null, p.place === 'line' ? null : placed[p.place]]}>
          {p.text}
        </Text>
      ))}
    </Text>
  );
}
