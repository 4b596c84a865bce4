import { plural } from './plural';

/**
 * The words and the one direction every screen (Overview, runs list, run page, failure table)
 * uses to compare a run with the completed run of its plan before it: ↑ is more failing than
 * before, ↓ less. A regression — a point that passed in the previous completed run and fails
 * now — is always "↑ regression", whatever the screen. Declared once here; the describers in
 * components/runs derive their sentences from it.
 */
export const COMPARISON_WORDS = {
  more: '↑',
  fewer: '↓',
  /** "↑ 31 regressions". */
  regressions: (n: number) => `↑ ${plural(n, 'regression', 'regressions')}`,
  /** A failure that is a regression, on a row or a case ("↑ regression"). */
  regressionMark: '↑ regression',
  /** What a regression is, for a caption or an accessible label. */
  regressionMeaning: 'passed in the previous completed run of the plan, fails now',
  /** The run it is compared with. */
  since: 'since the previous completed run',
  noRegressions: 'no regressions since the previous completed run',
  /** A completed run that had no completed run of its plan before it. */
  firstRun: 'first run of this plan to complete: nothing to compare with',
  /** "↑ 12 more failed" / "↓ 3 fewer in error"; null for no change. */
  change: (d: number, word: string) =>
    d > 0
      ? `↑ ${d.toLocaleString('en-GB')} more ${word}`
      : d < 0
        ? `↓ ${(-d).toLocaleString('en-GB')} fewer ${word}`
        : null,
  plural,
} as const;
