import { GLYPHS } from '../../constants/glyphs';

/** The glyph of each point outcome (all in IBM Plex Sans); always shown beside a number or a word. */
export const OUTCOME_GLYPH = {
  pass: GLYPHS.passed.glyph,
  fail: GLYPHS.failed.glyph,
  error: GLYPHS.error.glyph,
  skipped: GLYPHS.notInUse.glyph,
  notApplicable: GLYPHS.notApplicable.glyph,
} as const;
