import { Pool } from 'pg';
import { DATABASE_CONNECT_TIMEOUT_MS } from './database-connect-timeout-ms';
import { logPoolError } from './log-pool-error';

/**
 * A node-postgres pool that survives PostgreSQL going away: a lost idle connection is logged
 * (not thrown), and a connection attempt gives up after DATABASE_CONNECT_TIMEOUT_MS so a
 * request fails with 503 instead of waiting on a dead server.
 */
export function createPgPool(connectionString: string, max: number): Pool {
  const pool = new Pool({ connectionString, max, connectionTimeoutMillis: DATABASE_CONNECT_TIMEOUT_MS });
  pool.on('error', logPoolError);
  return pool;
}
