import { GLYPHS } from '../../constants/glyphs';
import { theme } from '../../constants/theme';
import type { DiagnosisKind } from '../../shared/diagnosis';
import { DIAGNOSIS_KIND_NAMES } from '../../shared/diagnosis-kind-names';
import { DIAGNOSIS_KINDS } from '../../shared/diagnosis-kinds';

/** Every way a failing point can be labelled: a diagnosis kind, or an outcome without one. */
export type DiagnosisTone = DiagnosisKind | 'error' | 'skipped';

/** Each kind's glyph, by its one meaning in constants/glyphs.ts. */
const GLYPH: Record<DiagnosisKind, string> = {
  'other-sheet': GLYPHS.otherSheet.glyph,
  'cut-side': GLYPHS.cutSide.glyph,
  'zero-sign': GLYPHS.signedZero.glyph,
  'misplaced-cut': GLYPHS.differs.glyph,
  inaccurate: GLYPHS.inaccurate.glyph,
  'not-finite': GLYPHS.notFinite.glyph,
  disagreement: GLYPHS.disagreement.glyph,
  unexplained: GLYPHS.unexplained.glyph,
};

interface DiagnosisStyle {
  word: string;
  glyph: string;
  color: string;
  explain: string;
}

const kindStyle = (kind: DiagnosisKind): DiagnosisStyle => ({
  word: DIAGNOSIS_KIND_NAMES[kind].name,
  glyph: GLYPH[kind],
  color: theme.kindInk[kind],
  explain: DIAGNOSIS_KIND_NAMES[kind].explain,
});

/**
 * A word, a glyph and a colour per diagnosis, so the table, the cards and the pictures read the
 * same way without colour. A kind's word and meaning are shared/diagnosis-kind-names.ts, its ink
 * theme.kindInk; an error's ink is theme.color.warn, as on every screen. Every glyph exists in IBM Plex Sans.
 */
export const DIAGNOSIS_STYLES: Record<DiagnosisTone, DiagnosisStyle> = {
  ...(Object.fromEntries(DIAGNOSIS_KINDS.map((k) => [k, kindStyle(k)])) as Record<DiagnosisKind, DiagnosisStyle>),
  error: {
    word: 'error',
    glyph: GLYPHS.error.glyph,
    color: theme.color.warn,
    explain: 'the library threw or timed out',
  },
  skipped: { word: 'skipped', glyph: GLYPHS.notInUse.glyph, color: theme.color.inkFaint, explain: 'not evaluated' },
};
