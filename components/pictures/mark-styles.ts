import { theme } from '../../constants/theme';

export type MarkTone = 'pass' | 'fail' | 'error' | 'skipped' | 'focus';

/**
 * How an evaluated point is drawn: each tone has a word and a shape of its own (dot, cross,
 * triangle, hollow square, ring), so the picture reads without colour.
 */
export const MARK_STYLES: Record<MarkTone, { color: string; word: string }> = {
  pass: { color: theme.color.accent, word: 'passed' },
  fail: { color: theme.color.danger, word: 'failed' },
  error: { color: theme.color.warn, word: 'error' },
  skipped: { color: theme.color.inkFaint, word: 'skipped' },
  focus: { color: theme.color.focus, word: 'this case' },
};
