/**
 * Every glyph the app shows as a sign, each with its one meaning. A glyph always stands beside a
 * word or a number (never alone), so it helps the eye without carrying the meaning by itself; a
 * state with no glyph here is said in words. Each exists in IBM Plex Sans
 * (tests/constants/font-coverage.test.ts), and `tests/constants/glyphs.test.ts` fails when two
 * meanings share a glyph or a screen uses a symbol that is not declared here.
 *
 * Choices: being chosen (a chip, a check box, a tab) is drawn (components/ui/radio-mark.tsx,
 * check-box-mark.tsx), not written with ✓; opening and closing a part is drawn too
 * (components/ui/disclosure-mark.tsx), which leaves ↑ and ↓ to counts that went up or down; the
 * navigation shows its labels alone. × and − also serve maths between two names or before a digit
 * ("suite × target", "−0"); as a leading sign they mean what is written here.
 */
export const GLYPHS = {
  passed: { glyph: '✓', meaning: 'in order: passed, held, approved, done' },
  failed: { glyph: '❌', meaning: 'failed: a finding, a law that did not hold, an action that failed' },
  error: { glyph: '◊', meaning: 'not judged: the library or the run erred, so nothing was checked' },
  notDone: { glyph: '×', meaning: 'not done: refused, cancelled, not delivered, not loaded, not checked' },
  notInUse: { glyph: '−', meaning: 'not in use: off, paused, skipped, retired, not installed' },
  notApplicable: { glyph: '–', meaning: 'does not apply to this point' },
  running: { glyph: '↻', meaning: 'running now' },
  notYet: { glyph: '…', meaning: 'not yet: queued, waiting to send, loading, a draft not yet submitted' },
  changed: { glyph: '∆', meaning: 'changed between two versions of a library' },
  differs: { glyph: '≠', meaning: 'differs from what is expected: a misplaced cut, a reference table, a convention' },
  disagreement: { glyph: '↔', meaning: 'another subject or entry of the same library gives another value' },
  cutSide: { glyph: '⇄', meaning: 'the value from the other side of a cut' },
  otherSheet: { glyph: '↷', meaning: 'the value of another sheet' },
  signedZero: { glyph: '±', meaning: 'about a signed zero: ±0 taken as the other sign, or the signed-zero convention' },
  inaccurate: { glyph: '≈', meaning: 'approximately: a value off by more than the tolerance' },
  notFinite: { glyph: '∞', meaning: 'infinite or not a number' },
  unexplained: { glyph: '?', meaning: 'matches nothing we know how to compute' },
  counterClockwise: { glyph: '↺', meaning: 'counter-clockwise: a path direction or the continuity convention' },
  submitted: { glyph: '↗', meaning: 'sent for review' },
  sentBack: { glyph: '↩', meaning: 'sent back: changes requested' },
  more: { glyph: '↑', meaning: 'more, or new, than in the previous run' },
  fewer: { glyph: '↓', meaning: 'fewer than in the previous run' },
  back: { glyph: '←', meaning: 'back to where this came from' },
  onward: { glyph: '→', meaning: 'goes to another screen or a next step' },
  listItem: { glyph: '•', meaning: 'an item of a list' },
  squareRoot: { glyph: '√', meaning: 'the square root, in maths' },
  atMost: { glyph: '≤', meaning: 'at most, in maths' },
} as const satisfies Record<string, { glyph: string; meaning: string }>;
