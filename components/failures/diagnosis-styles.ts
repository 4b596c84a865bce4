import { theme } from '../../constants/theme';

/** Every way a failing point can be labelled: a diagnosis kind, or an outcome without one. */
export type DiagnosisTone =
  | 'other-sheet'
  | 'cut-side'
  | 'zero-sign'
  | 'misplaced-cut'
  | 'inaccurate'
  | 'not-finite'
  | 'disagreement'
  | 'unexplained'
  | 'error'
  | 'skipped';

/**
 * A word, a glyph and a colour per diagnosis, so the table, the cards and the pictures read the
 * same way without colour. Every glyph exists in IBM Plex Sans.
 */
export const DIAGNOSIS_STYLES: Record<DiagnosisTone, { word: string; glyph: string; color: string; explain: string }> =
  {
    'other-sheet': {
      word: 'other sheet',
      glyph: '↻',
      color: '#A8432E',
      explain: 'the value is the expected one on another sheet',
    },
    'cut-side': {
      word: 'cut side',
      glyph: '⇄',
      color: '#8A5A00',
      explain: 'the value is the limit from the other side of the cut',
    },
    'zero-sign': { word: 'zero sign', glyph: '±', color: '#6A4C93', explain: 'a ±0 was treated as the other sign' },
    'misplaced-cut': {
      word: 'misplaced cut',
      glyph: '≠',
      color: '#9C2F5E',
      explain: 'a jump where none is expected, or none where one is',
    },
    inaccurate: {
      word: 'inaccurate',
      glyph: '≈',
      color: '#2F5F8A',
      explain: 'right sheet and side of every cut, error over the tolerance',
    },
    'not-finite': {
      word: 'not finite',
      glyph: '∞',
      color: '#5B6B2E',
      explain: 'an infinite or NaN part where the reference is finite, or the reverse',
    },
    disagreement: {
      word: 'disagreement',
      glyph: '↔',
      color: '#7B3F00',
      explain: 'another subject or entry of the same library gives a different value here',
    },
    unexplained: {
      word: 'unexplained',
      glyph: '?',
      color: theme.color.inkSoft,
      explain: 'none of the alternatives we know how to compute',
    },
    error: { word: 'error', glyph: '×', color: '#7A4E9A', explain: 'the library threw or timed out' },
    skipped: { word: 'skipped', glyph: '…', color: theme.color.inkFaint, explain: 'not evaluated' },
  };
