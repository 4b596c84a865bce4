import type { RunView } from '../../shared/run-view';
import { formatDuration } from './format-duration';

/**
 * How long a run took ("3 min 5 s"), how long it has been running ("running 42 s"), or that it
 * has not started ("not started").
 */
export function runDuration(run: Pick<RunView, 'startedAt' | 'finishedAt'>, now: number = Date.now()): string {
  if (!run.startedAt) return 'not started';
  const start = new Date(run.startedAt).getTime();
  if (!run.finishedAt) return `running ${formatDuration(now - start)}`;
  return formatDuration(new Date(run.finishedAt).getTime() - start);
}
