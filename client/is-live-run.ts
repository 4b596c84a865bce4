import type { RunView } from '../shared/run-view';

/** A run whose progress still moves: the screens showing it poll until it finishes. */
export function isLiveRun(run: Pick<RunView, 'status'>): boolean {
  return run.status === 'queued' || run.status === 'running';
}
