import { availableParallelism } from 'node:os';
import path from 'node:path';
import type { FindingsRequest } from './findings-messages';
import { HttpError } from '../http/http-error';
import { ThreadPool } from '../workers/thread-pool';
import type { WithoutId } from '../workers/without-id';

/**
 * Threads for findings: one per core, at least 2 and at most 4. With one thread a reviewer's
 * fingerprint waited 13.3 s behind 12 cut maps (up to ~0.7 s each at 201×201, ~1.1 s for each
 * mathjs version a thread loads); with two on the 2-core machine a short request starts beside
 * a long one. More than the cores only share them, and each thread holds its own copies of the
 * libraries (~60 MB with mathjs loaded).
 */
export const FINDINGS_THREADS = Math.min(4, Math.max(2, availableParallelism()));
/** Requests of one lane waiting at most: 16 is ~12 s of the longest cut maps on two threads; beyond that a 503 says so at once. */
export const FINDINGS_QUEUE = 16;

/**
 * Version matrices go in a lane of their own that may hold every thread but one, so a fingerprint
 * or a cut map always has a thread that no matrix holds. The library screen asks for a matrix in
 * groups of four suites (use-version-matrix.ts), 11 requests for the demo catalogue at ~0.35–7 s
 * each; in one first-come queue they took both threads, and a fingerprint asked next waited
 * 13.9 s behind them (issue 15, point 9).
 */
const laneOf = (kind: FindingsRequest['kind']) => (kind === 'version-matrix' ? 'matrix' : 'view');

/**
 * The server's side of the findings threads: fingerprints, cut maps and version matrices on a
 * small pool (thread-pool.ts). A request that takes longer than `limitMs` (a hung library)
 * stops its thread and answers 503; a full queue answers 503 at once.
 */
export class FindingsPool {
  private readonly pool: ThreadPool<FindingsRequest>;

  constructor(
    private readonly limitMs = 120_000,
    size = FINDINGS_THREADS,
    queueLimit = FINDINGS_QUEUE,
  ) {
    this.pool = new ThreadPool<FindingsRequest>({
      entry: path.join(__dirname, 'findings-worker-entry.cjs'),
      size,
      queueLimit,
      laneLimits: { matrix: Math.max(1, size - 1) },
      full: () =>
        new HttpError(503, {
          kind: 'unavailable',
          message: `${queueLimit} library computations of this kind are already waiting; try again in a minute.`,
        }),
    });
  }

  ask(request: WithoutId<FindingsRequest>): Promise<unknown> {
    return this.pool.run(
      request,
      this.limitMs,
      () =>
        new HttpError(503, {
          kind: 'unavailable',
          message: `The library took longer than ${this.limitMs / 1000} s; it was stopped. Try a smaller request.`,
        }),
      laneOf(request.kind),
    );
  }

  /** Threads started and ready for a request. */
  get ready(): number {
    return this.pool.ready;
  }

  /** Threads computing now. */
  get busy(): number {
    return this.pool.busy;
  }

  /** Ends the threads; what is still waiting is answered 503. */
  close(): Promise<void> {
    return this.pool.close();
  }
}
