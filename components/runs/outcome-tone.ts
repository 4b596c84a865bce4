import { theme } from '../../constants/theme';

export type Tone = 'pass' | 'fail' | 'error' | 'neutral' | 'live';

/** The colours of each tone; every use pairs them with a glyph and a word. */
export const OUTCOME_TONE: Record<Tone, { ink: string; soft: string; edge: string }> = {
  pass: { ink: theme.color.accent, soft: theme.color.accentSoft, edge: theme.color.accent },
  fail: { ink: theme.color.danger, soft: theme.color.dangerSoft, edge: theme.color.danger },
  error: { ink: theme.color.warn, soft: theme.color.warnSoft, edge: theme.color.focus },
  neutral: { ink: theme.color.inkSoft, soft: theme.color.paper, edge: theme.color.rule },
  live: { ink: theme.color.ink, soft: theme.color.panel, edge: theme.color.inkFaint },
};
