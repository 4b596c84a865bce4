/** Our one-glyph check-mark font (scripts/make-marks-font.ts), first in every family on the web. */
export const MARKS_FAMILY = 'SheetkeeperMarks';
