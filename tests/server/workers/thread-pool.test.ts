import path from 'node:path';
import { HttpError } from '../../../server/http/http-error';
import { ThreadPool } from '../../../server/workers/thread-pool';

jest.setTimeout(30_000);

type Busy = { id: number; ms: number };
const entry = path.join(__dirname, 'busy-worker-entry.cjs');
const full = () => new HttpError(503, { kind: 'unavailable', message: 'busy' });
const overLimit = () => new HttpError(422, { kind: 'unavailable', message: 'over' });

const timed = async <T>(work: () => Promise<T>) => {
  const started = performance.now();
  const value = await work();
  return { value, ms: performance.now() - started };
};

describe('ThreadPool', () => {
  it('runs as many requests at once as it has threads, each on its own thread', async () => {
    const pool = new ThreadPool<Busy>({ entry, size: 3, queueLimit: 0, full });
    try {
      // Warm the threads (tsx's start-up is ~0.3–1 s per thread on the shared machine).
      await Promise.all([1, 2, 3].map(() => pool.run({ ms: 1 }, 20_000, overLimit)));
      const { value, ms } = await timed(() =>
        Promise.all([1, 2, 3].map(() => pool.run({ ms: 600 }, 20_000, overLimit))),
      );
      expect(new Set(value).size).toBe(3);
      // One after another would be ≥ 1,800 ms.
      expect(ms).toBeLessThan(1500);
    } finally {
      await pool.close();
    }
  });

  it('keeps further requests in its bounded queue and refuses one beyond it at once', async () => {
    const pool = new ThreadPool<Busy>({ entry, size: 1, queueLimit: 2, full });
    try {
      await pool.run({ ms: 1 }, 20_000, overLimit);
      const running = [1, 2, 3].map(() => pool.run({ ms: 300 }, 20_000, overLimit));
      expect(pool.busy).toBe(1);
      expect(pool.waiting).toBe(2);
      await expect(pool.run({ ms: 1 }, 20_000, overLimit)).rejects.toMatchObject({ status: 503 });
      await expect(Promise.all(running)).resolves.toHaveLength(3);
    } finally {
      await pool.close();
    }
  });

  it('refuses a request whose lane is at its limit and whose queue is full, though a thread kept for other lanes is idle', async () => {
    const pool = new ThreadPool<Busy>({ entry, size: 2, queueLimit: 1, full, laneLimits: { slow: 1 } });
    try {
      await Promise.all([1, 2].map(() => pool.run({ ms: 1 }, 20_000, overLimit)));
      const running = pool.run({ ms: 300 }, 20_000, overLimit, 'slow');
      const queued = pool.run({ ms: 1 }, 20_000, overLimit, 'slow');
      expect(pool.busy).toBe(1);
      expect(pool.waiting).toBe(1);
      await expect(pool.run({ ms: 1 }, 20_000, overLimit, 'slow')).rejects.toMatchObject({ status: 503 });
      // The idle thread still serves another lane at once.
      await expect(pool.run({ ms: 1 }, 20_000, overLimit, 'quick')).resolves.toBeDefined();
      await expect(Promise.all([running, queued])).resolves.toHaveLength(2);
    } finally {
      await pool.close();
    }
  });

  it('stops a request over its time limit with the caller’s answer and serves the next on a fresh thread', async () => {
    const pool = new ThreadPool<Busy>({ entry, size: 1, queueLimit: 4, full });
    try {
      const first = await pool.run({ ms: 1 }, 20_000, overLimit);
      const late = pool.run({ ms: 60_000 }, 200, overLimit);
      const next = pool.run({ ms: 1 }, 20_000, overLimit);
      await expect(late).rejects.toMatchObject({ status: 422 });
      const fresh = await next;
      expect(fresh).not.toBe(first);
    } finally {
      await pool.close();
    }
  });
});
