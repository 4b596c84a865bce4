import { parentPort } from 'node:worker_threads';
import { HttpError } from '../http/http-error';
import { InputError } from '../http/input-error';
import type { ThreadReply } from './thread-reply';

/**
 * The body of a pool thread (thread-pool.ts): answers each `{ id, ...request }` with
 * `compute(request)`. The pool gives a thread one request at a time; should two arrive, they run
 * in turn, so a thread never holds two computations' memory at once. It says 'ready' first.
 */
export function serveThreadRequests<R extends { id: number }>(
  compute: (request: R) => Promise<unknown> | unknown,
): void {
  const port = parentPort;
  if (!port) throw new Error('serveThreadRequests runs in a worker thread');
  let chain = Promise.resolve();
  port.on('message', (request: R) => {
    chain = chain.then(async () => {
      let reply: ThreadReply;
      try {
        reply = { id: request.id, ok: true, value: await compute(request) };
      } catch (err) {
        reply = { id: request.id, ok: false, failure: failureOf(err) };
      }
      port.postMessage(reply);
    });
  });
  // Everything this thread imports is loaded by now: the pool may start the clock on its requests.
  port.postMessage('ready');
}

function failureOf(err: unknown): Extract<ThreadReply, { ok: false }>['failure'] {
  if (err instanceof HttpError) return { kind: 'http', status: err.status, body: err.body };
  if (err instanceof InputError) return { kind: 'input', issues: err.issues };
  return { kind: 'error', message: err instanceof Error ? err.message : String(err) };
}
