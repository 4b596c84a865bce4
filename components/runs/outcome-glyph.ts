/** The glyph of each point outcome (all in IBM Plex Sans); always shown beside a number or a word. */
export const OUTCOME_GLYPH = { pass: '✓', fail: '❌', error: '◊', skipped: '−', notApplicable: '–' } as const;
