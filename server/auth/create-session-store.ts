import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import type { Pool } from 'pg';
import { describeError } from '../database/describe-error';
import type { ShortLivedCache } from './short-lived-cache';

/**
 * Sessions in PostgreSQL (connect-pg-simple), with each session row kept for a moment in
 * this process. Measured with `BENCH_TABLE_ONLY=1 npm run bench:server` on this 2-core
 * machine: without the cache every API request spent two of its three queries on the session
 * and the user, and the failure table served 244 requests/s at p95 337 ms.
 * A sign-out or a new session in this process drops its entry at once; one in another server
 * process is seen here within the cache's lifetime. `cache` (session id → the row's JSON) is the
 * caller's, so ending a user's sessions (session-control.ts) can clear it.
 */
export function createSessionStore(pool: Pool, cache: ShortLivedCache<string>): session.Store {
  const PgStore = connectPgSimple(session);
  // No touch: express-session would otherwise UPDATE the session row on every request; a
  // session therefore lasts its cookie's maxAge from sign-in, not from the last request.
  const store = new PgStore({
    pool,
    tableName: 'sessions',
    createTableIfMissing: false,
    pruneSessionInterval: 15 * 60,
    disableTouch: true,
    // Pruning expired sessions fails while PostgreSQL is down; logged without the error's values.
    errorLog: (message: unknown, err?: unknown) =>
      console.error(`[sheetkeeper] sessions: ${String(message)}`, describeError(err)),
  });
  const get = store.get.bind(store);
  const set = store.set.bind(store);
  const destroy = store.destroy.bind(store);
  // express-session mutates the object it gets, so the cache keeps JSON and hands out copies.
  store.get = (sid, callback) => {
    const hit = cache.get(sid);
    if (hit !== undefined) return callback(null, JSON.parse(hit));
    get(sid, (err, sess) => {
      if (!err && sess) cache.set(sid, JSON.stringify(sess));
      callback(err, sess);
    });
  };
  store.set = (sid, sess, callback) => {
    cache.delete(sid);
    set(sid, sess, callback);
  };
  store.destroy = (sid, callback) => {
    cache.delete(sid);
    destroy(sid, callback);
  };
  return store;
}
