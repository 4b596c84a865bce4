/**
 * How a dead worker's shard is noticed. While a worker runs a shard it holds the session-level
 * advisory lock (`lockClass`, hashtext(shard id)) on a connection of its own; PostgreSQL drops
 * it the moment that connection dies (kill -9 closes the socket at once), and every process with
 * workers looks every `sweepMs` for a running shard, claimed more than `claimGraceMs` ago, whose
 * lock nobody holds, and queues it again (requeue-stale-shards.ts).
 *
 * Why a lock and not a heartbeat timer: a shard on an in-process library blocks the event loop
 * for its whole evaluation (the crash test's asin suite with a 50 × 50 grid: 2.7 s measured, one
 * gap of 2.7 s in a 20 ms interval timer), and a shard may rightly run up to its 120 s time limit,
 * so a timer's beats could not tell a busy worker from a dead one without waiting minutes. The
 * lock is the only way back since the queue left pg-boss (sql-shard-queue.ts), whose 600 s job
 * expiry was the last resort before: issue 11 saw "running 49/50" for 10 min 25 s.
 */
export const SHARD_LIVENESS = { lockClass: 7341, sweepMs: 2000, claimGraceMs: 2000 } as const;
