import { plural } from '../../shared/plural';
import type { RunView } from '../../shared/run-view';
import type { Tone } from './outcome-tone';
import { STOPPED_BY_ERROR } from '../../shared/stopped-by-error';

export interface RunVerdict {
  glyph: string;
  word: string;
  tone: Tone;
  /** How many checks were stopped by an error, in words ("2 checks stopped by an error"); null when none. */
  stopped: string | null;
  /**
   * When no point failed but checks did, what they failed on, in words ("1 check failed a property
   * law or monodromy check; every point passed"); null otherwise: failing points say it themselves.
   */
  beyondPoints: string | null;
  /** The word, the checks beyond the points and the stopped checks in one phrase, for a screen reader. */
  said: string;
}

/**
 * A run's state in a glyph, words and a tone: the one judge of a run, for every screen that shows
 * one (runs list, cards, the Overview, the run page), from the run view alone. A completed run is
 * judged by its points and its checks: any failure makes it "completed with failures" even when
 * most points passed, and so does a check that failed a property law or a monodromy check with
 * every point passed (`checksFailed`); a point in error, or a check stopped by an error (`checksStopped`, the run
 * matrix's error cells: a library that lacks the function has every point of that check skipped),
 * makes it "completed with errors", never "all checked points passed". Stopped checks are counted
 * in words whatever the state, so a red or grey verdict does not hide them either.
 */
export function runVerdict(run: Judged): RunVerdict {
  const state = judge(run);
  const stopped = run.checksStopped > 0 ? `${plural(run.checksStopped, 'check')} ${STOPPED_BY_ERROR}` : null;
  const beyondPoints =
    run.status === 'completed' && run.counts.fail === 0 && run.checksFailed > 0
      ? `${plural(run.checksFailed, 'check')} failed a property law or monodromy check; every point passed`
      : null;
  const said = [state.word, beyondPoints, stopped].filter(Boolean).join(', ');
  return { ...state, stopped, beyondPoints, said };
}

type Judged = Pick<RunView, 'status' | 'counts' | 'checksStopped' | 'checksFailed'>;

function judge(run: Judged): { glyph: string; word: string; tone: Tone } {
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
      // Every point passed, yet a check failed: on a property law or a monodromy check (`beyondPoints` says so).
      if (run.checksFailed > 0) return { glyph: '❌', word: 'completed with failures', tone: 'fail' };
      if (run.counts.error > 0 || run.checksStopped > 0)
        return { glyph: '◊', word: 'completed with errors', tone: 'error' };
      if (run.counts.pass === 0) return { glyph: '◊', word: 'completed, nothing passed', tone: 'error' };
      return { glyph: '✓', word: 'all checked points passed', tone: 'pass' };
  }
}
