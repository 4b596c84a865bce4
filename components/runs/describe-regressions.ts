import { COMPARISON_WORDS as W } from '../../shared/comparison-words';
import type { RunView } from '../../shared/run-view';

/**
 * A run's regressions in words, the same on the Overview, the runs list and the run page:
 * "↑ 31 regressions since the previous completed run", or why there is no comparison (still
 * running, cancelled, failed, or the plan's first run to complete). `count` is the number to
 * link to the failure table, when there are any.
 */
export function describeRegressions(run: Pick<RunView, 'status' | 'regressions'>): { text: string; count: number } {
  switch (run.status) {
    case 'queued':
    case 'running':
      return { text: 'regressions are counted when the run completes', count: 0 };
    case 'cancelled':
      return { text: 'not compared: the run was cancelled before every pair was checked', count: 0 };
    case 'failed':
      return { text: 'not compared: the run failed before every pair was checked', count: 0 };
    case 'completed':
      if (run.regressions === null) return { text: W.firstRun, count: 0 };
      if (run.regressions === 0) return { text: W.noRegressions, count: 0 };
      return { text: `${W.regressions(run.regressions)} ${W.since}`, count: run.regressions };
  }
}
