import { Text, type StyleProp, type TextStyle } from 'react-native';
import { theme } from '../../constants/theme';
import { formulaPieces } from './formula-pieces';
import { formulaSpeech } from './formula-speech';

/**
 * A formula (or a sentence with formulas in it) set as maths: exponents raised and smaller,
 * indices lowered, one-letter variables in italics, real minus signs (formula-pieces.ts reads
 * the text). `size` is the surrounding text's size in px, which raised text is set against;
 * nested inside an SkText it takes that text's family and colour. Text with nothing to set
 * apart stays one run of text, as plain text would be.
 *
 * A screen reader hears its spoken form (formula-speech.ts: "z squared minus 1", not the flat
 * "z2 − 1" of the raised pieces): the text is a `math` element named by it, and the pieces are
 * hidden from the accessibility tree, so nothing is read twice. The spoken form comes from the
 * same reading as the pieces, so the two cannot disagree.
 */
export function FormulaText({
  text,
  size = theme.size.body,
  variables = true,
  typed = false,
  style,
  testID,
}: {
  text: string;
  size?: number;
  /** false: raise exponents only, leaving letters and signs as typed (rules that quote a field's value). */
  variables?: boolean;
  /** true: shown exactly as typed, nothing set (a subject, code to copy), and still said as maths. */
  typed?: boolean;
  style?: StyleProp<TextStyle>;
  testID?: string;
}) {
  if (typed) {
    const spoken = formulaSpeech(text, { variables });
    return spoken === text && !style && !testID ? (
      <>{text}</>
    ) : (
      <Text style={style} testID={testID} role="math" aria-label={spoken}>
        <Text aria-hidden>{text}</Text>
      </Text>
    );
  }
  const pieces = formulaPieces(text, { variables });
  // Text with nothing raised, lowered or set as a variable reads as it stands ("with -1 the circle has no points").
  const plain = pieces.every((p) => p.place === 'line' && !p.italic);
  if (plain && !style && !testID) return <>{pieces.map((p) => p.text).join('')}</>;
  // 0.72 of the line's size, and never under 9 px, the least IBM Plex stays legible at.
  const fontSize = Math.max(9, Math.round(size * 0.72));
  // On the web a span's vertical-align: top sets it at the top of the line (raised), bottom at its foot.
  const placed: Record<'sup' | 'sub', TextStyle> = {
    sup: { fontSize, verticalAlign: 'top' },
    sub: { fontSize, verticalAlign: 'bottom' },
  };
  const set = pieces.map((p, i) => (
    <Text key={i} style={[p.italic ? { fontStyle: 'italic' } : null, p.place === 'line' ? null : placed[p.place]]}>
      {p.text}
    </Text>
  ));
  if (plain)
    return (
      <Text style={style} testID={testID}>
        {set}
      </Text>
    );
  return (
    <Text style={style} testID={testID} role="math" aria-label={formulaSpeech(text, { variables })}>
      <Text aria-hidden>{set}</Text>
    </Text>
  );
}
