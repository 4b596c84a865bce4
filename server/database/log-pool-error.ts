import { describeError } from './describe-error';

/**
 * The 'error' listener every pg Pool gets. An idle pooled connection that PostgreSQL closes
 * (a restart, `pg_terminate_backend`, 57P01) is reported here; without a listener node-postgres
 * rethrows it and the process exits. The pool has already dropped that connection and opens
 * a new one on the next query, so logging is all there is to do.
 */
export function logPoolError(err: Error): void {
  console.error(`[sheetkeeper] a database connection was lost (the next query opens a new one): ${describeError(err)}`);
}
