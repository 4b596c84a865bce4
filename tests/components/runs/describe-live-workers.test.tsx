import { describeLiveWorkers } from '../../../components/runs/describe-live-workers';
import type { WorkerView } from '../../../shared/worker-view';

const worker = (label: string, targets: number): WorkerView => ({
  id: label,
  label,
  targets: Array.from({ length: targets }, (_, i) => `lib@1.${i}.0`),
  startedAt: '2026-12-05T06:00:00Z',
  heartbeatAt: '2026-12-05T06:10:00Z',
});

describe('describeLiveWorkers', () => {
  it('lists each live worker with how many targets it takes', () => {
    expect(describeLiveWorkers([worker('a:123', 12), worker('b:456', 3)])).toBe(
      '2 workers: a:123 (12 targets), b:456 (3 targets)',
    );
    expect(describeLiveWorkers([worker('a:123', 1)])).toBe('1 worker: a:123 (1 target)');
  });

  it('says plainly that nothing will run while no worker is running', () => {
    expect(describeLiveWorkers([])).toBe('No worker is running: queued pairs wait until one starts.');
  });
});
