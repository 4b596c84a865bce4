/**
 * Milliseconds of CPU (user + system, every thread of the process) that `work` takes. The sweep's
 * and the engine tests' 50 ms bound is checked on this rather than on the clock: under `npm test`
 * three jest workers and the e2e run share two cores, and a 16 ms table build read 54.8 ms of wall
 * time there. On a quiet machine the two agree for this single-threaded work.
 */
export function cpuMilliseconds(work: () => unknown): number {
  const start = process.cpuUsage();
  work();
  const used = process.cpuUsage(start);
  return (used.user + used.system) / 1000;
}
