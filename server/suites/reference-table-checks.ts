import path from 'node:path';
import type { ReferenceTableCheck } from '../../shared/reference-table-check';
import type { Suite } from '../../shared/schemas/suite-schema';
import { HttpError } from '../http/http-error';
import { ThreadPool } from '../workers/thread-pool';
import type { ReferenceTableRequest } from './reference-table-request';

/**
 * How long one uploaded table may take. Measured on the 2-core machine (shared): plain subjects
 * cost ~0.1 ms a row (sqrt 2,000 rows 164 ms, asin 1,000 rows 103 ms), so the 5,000-row limit is
 * ~0.5 s; `pow(z,z)*pow(z,-z)-1` costs 0.23–0.55 s a row (the reference raises its precision
 * until it can round a value that cancels to 0), so a 40-row table took 9–22 s and froze the
 * server when it ran on the request thread. 10 s leaves every plain table ~20× room.
 */
export const REFERENCE_TABLE_BUDGET_MS = 10_000;
/** Two threads: two contributors' tables at once on the 2-core machine; four more may wait, then 503. */
const THREADS = 2;
const QUEUE = 4;

/**
 * Checks uploaded reference tables on a small pool of worker threads with a time budget, so one
 * expensive table never holds up anyone else's request. Over the budget the thread is stopped
 * and the caller gets 422 saying what was checked and how to ask for less.
 */
export class ReferenceTableChecks {
  private readonly pool = new ThreadPool<ReferenceTableRequest>({
    entry: path.join(__dirname, 'reference-table-worker-entry.cjs'),
    size: THREADS,
    queueLimit: QUEUE,
    full: () =>
      new HttpError(503, {
        kind: 'unavailable',
        message: `${THREADS + QUEUE} reference tables are already being checked or waiting; try again in a minute.`,
      }),
  });

  constructor(private readonly budgetMs = REFERENCE_TABLE_BUDGET_MS) {}

  async check(suite: Suite, csv: string): Promise<ReferenceTableCheck> {
    const budgetSeconds = this.budgetMs / 1000;
    return (await this.pool.run({ suite, csv }, this.budgetMs, () => {
      // Data lines, for the message only (the check itself counts CSV records).
      const rows = Math.max(0, csv.split('\n').filter((line) => line.trim() !== '').length - 1);
      return new HttpError(422, {
        kind: 'over-time-budget',
        budgetSeconds,
        message:
          `Checking ${rows} row${rows === 1 ? '' : 's'} against the subject ${suite.subject} (${suite.convention}, ` +
          `${suite.branch.kind} branch, suite ${suite.id}) took longer than ${budgetSeconds} s and was stopped; ` +
          'nothing was stored. Upload fewer rows (split the table into smaller files) or check a suite with a simpler subject.',
      });
    })) as ReferenceTableCheck;
  }

  /** Ends the threads; a table still being checked is answered 503. */
  close(): Promise<void> {
    return this.pool.close();
  }
}
