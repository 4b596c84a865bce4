import type { WorkerView } from '../../shared/worker-view';
import { plural } from '../../shared/plural';

/** What the run page and the Libraries screen say when no worker is running. */
export const NO_LIVE_WORKER_WORDS = 'No worker is running: queued pairs wait until one starts.';

/** "1 target", "12 targets": how many targets a worker announces. */
export const targetCountWords = (n: number): string => plural(n, 'target');

/** The live workers in one line: "2 workers: a:123 (12 targets), b:456 (3 targets)", or that none runs. */
export function describeLiveWorkers(workers: readonly WorkerView[]): string {
  if (workers.length === 0) return NO_LIVE_WORKER_WORDS;
  return `${plural(workers.length, 'worker')}: ${workers.map((w) => `${w.label} (${targetCountWords(w.targets.length)})`).join(', ')}`;
}
