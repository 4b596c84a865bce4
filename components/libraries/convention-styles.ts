import { GLYPHS } from '../../constants/glyphs';
import { theme } from '../../constants/theme';
import type { ConventionFingerprint } from '../../shared/convention-fingerprint';

export type Behaviour = ConventionFingerprint['cuts'][number]['behaviour'];

/**
 * How a fingerprint verdict is shown: a glyph and words of its own for each, so the table reads
 * without colour. Both conventions are legitimate (a library may document either), so they share
 * the accent; `neither` and `inconsistent` are what a maintainer should look at.
 */
export const CONVENTION_STYLES: Record<Behaviour, { glyph: string; word: string; color: string; meaning: string }> = {
  'signed-zero': {
    glyph: GLYPHS.signedZero.glyph,
    word: 'signed zero',
    color: theme.color.accent,
    meaning: 'on the cut, +0 and −0 gave the two one-sided limits (IEC 60559 / ISO C Annex G)',
  },
  'counter-clockwise': {
    glyph: GLYPHS.counterClockwise.glyph,
    word: 'counter-clockwise',
    color: theme.color.accent,
    meaning:
      'on the cut, both zero signs gave the limit from the side counter-clockwise continuity closes; the zero sign was ignored',
  },
  neither: {
    glyph: GLYPHS.unexplained.glyph,
    word: 'neither',
    color: theme.color.danger,
    meaning:
      'the values on the cut follow neither convention (sides swapped, the open side closed, the cut elsewhere, or no value)',
  },
  inconsistent: {
    glyph: GLYPHS.differs.glyph,
    word: 'inconsistent',
    color: theme.color.warn,
    meaning: 'places on this cut disagree among themselves, or functions sharing the cut follow different conventions',
  },
};
