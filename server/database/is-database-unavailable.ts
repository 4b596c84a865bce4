/**
 * Whether an error means PostgreSQL cannot be reached right now (as opposed to a query that is
 * wrong): the connection was refused, reset, timed out or terminated, or the server ended the
 * session. TypeORM wraps a driver error in `driverError`; both are looked at.
 *
 * A FATAL (or PANIC) report from PostgreSQL always ends the session, whatever its code: the
 * backend was terminated (57P01, `pg_terminate_backend`), the server is shutting down or
 * starting (57P01–57P03), too many connections (53300), or the database refuses connections
 * (55000, `ALTER DATABASE … ALLOW_CONNECTIONS false`). Class 08 is "connection exception".
 */
export function isDatabaseUnavailable(err: unknown): boolean {
  for (let e: unknown = err, depth = 0; e && typeof e === 'object' && depth < 3; depth += 1) {
    const { code, severity, message } = e as { code?: unknown; severity?: unknown; message?: unknown };
    if (severity === 'FATAL' || severity === 'PANIC') return true;
    if (typeof code === 'string' && (code.startsWith('08') || code.startsWith('57P') || NETWORK_CODES.has(code)))
      return true;
    if (typeof message === 'string' && DRIVER_MESSAGES.some((m) => message.includes(m))) return true;
    e = (e as { driverError?: unknown }).driverError;
  }
  return false;
}

/** Node's socket errors on the way to PostgreSQL. */
const NETWORK_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', 'EHOSTUNREACH', 'ENOTFOUND']);

/** What node-postgres (pg 8, pg-pool 3) says when a connection dies or cannot be made in time. */
const DRIVER_MESSAGES = [
  'Connection terminated',
  'timeout exceeded when trying to connect',
  'Client has encountered a connection error and is not queryable',
  'Client was closed and is not queryable',
];
