import type { WorkerView } from '../../shared/worker-view';

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

/** The live workers in one line: "2 workers: a:123 (12 targets), b:456 (3 targets)", or that none runs. */
export function describeLiveWorkers(workers: readonly WorkerView[]): string {
  if (workers.length === 0) return 'No worker is running: queued pairs wait until one starts.';
  return `${plural(workers.length, 'worker')}: ${workers.map((w) => `${w.label} (${plural(w.targets.length, 'target')})`).join(', ')}`;
}
