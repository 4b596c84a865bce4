import { serveThreadRequests } from '../../../server/workers/serve-thread-requests';

/** Blocks its thread for `ms` (as a synchronous computation would) and answers with its thread's id. */
serveThreadRequests<{ id: number; ms: number }>(({ ms }) => {
  Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, ms);
  return process.pid + ':' + require('node:worker_threads').threadId;
});
