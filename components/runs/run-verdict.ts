import type { RunView } from '../../shared/run-view';
import type { Tone } from './outcome-tone';
import type { CellTally } from './tally-cells';

/**
 * A run's state in a glyph, words and a tone. A completed run is judged by its points: any
 * failure makes it "completed with failures" even when most points passed. Given its checks
 * (the run page knows them from its matrix), a check stopped by an error with no point in
 * error (every point skipped: the library lacks the function) makes it "completed with errors"
 * too, rather than "all checked points passed".
 */
export function runVerdict(
  run: Pick<RunView, 'status' | 'counts'>,
  checks?: Pick<CellTally, 'error'>,
): { glyph: string; word: string; tone: Tone } {
  switch (run.status) {
    case 'queued':
      return { glyph: '…', word: 'queued', tone: 'live' };
    case 'running':
      return { glyph: '↻', word: 'running', tone: 'live' };
    case 'cancelled':
      return { glyph: '×', word: 'cancelled', tone: 'neutral' };
    case 'failed':
      return { glyph: '◊', word: 'run failed', tone: 'error' };
    case 'completed':
      if (run.counts.fail > 0) return { glyph: '❌', word: 'completed with failures', tone: 'fail' };
      if (run.counts.error > 0 || (checks?.error ?? 0) > 0)
        return { glyph: '◊', word: 'completed with errors', tone: 'error' };
      if (run.counts.pass === 0) return { glyph: '◊', word: 'completed, nothing passed', tone: 'error' };
      return { glyph: '✓', word: 'all checked points passed', tone: 'pass' };
  }
}
