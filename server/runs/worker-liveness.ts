/**
 * How a worker process is known to be alive. It holds the session-level advisory lock
 * (`lockClass`, hashtext(worker id)) on a connection of its own for as long as it runs, and beats
 * every `heartbeatMs`. It counts as live while it has not said it stopped and either holds its
 * lock or beat within `staleMs`: the lock vanishes the moment a killed process's socket closes,
 * and it cannot be starved by a shard that blocks the event loop (up to the 120 s shard time
 * limit, shard-liveness.ts); the beat covers a lock connection lost in a database blip until the
 * next beat takes the lock again. Another class than the shards' lock, so a worker's key never
 * meets a shard's.
 *
 * Its targets are looked for again every `targetsRefreshMs`, not at every beat, so that a target an
 * admin adds is announced within a minute. Only the admin-added ones can change: the installed ones
 * are discovered once per process (installed-targets.ts), the same list the worker opens shards from,
 * so it never announces a target it cannot open.
 */
export const WORKER_LIVENESS = {
  lockClass: 7342,
  heartbeatMs: 5000,
  staleMs: 15_000,
  targetsRefreshMs: 60_000,
} as const;
