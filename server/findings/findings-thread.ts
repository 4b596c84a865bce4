import path from 'node:path';
import { Worker } from 'node:worker_threads';
import type { FindingsReply, FindingsRequest } from './findings-messages';
import { HttpError } from '../http/http-error';
import { InputError } from '../http/input-error';

type Pending = {
  resolve: (value: unknown) => void;
  reject: (err: Error) => void;
  timer: ReturnType<typeof setTimeout>;
};
/** What a caller sends: a request without its id (Omit applied to each kind of request). */
type WithoutId<R> = R extends unknown ? Omit<R, 'id'> : never;
type Ask = WithoutId<FindingsRequest>;

/**
 * The server's side of the findings thread: one worker thread, started on first use, that runs
 * fingerprints, cut maps and version matrices in the order asked. A request that takes longer
 * than `limitMs` (a hung library) stops the thread and answers 503; so does a thread that dies.
 * The next request starts a fresh one. The thread does not keep the process alive.
 */
export class FindingsThread {
  private worker: Worker | null = null;
  private readonly pending = new Map<number, Pending>();
  private nextId = 1;

  constructor(private readonly limitMs = 120_000) {}

  ask(request: Ask): Promise<unknown> {
    const worker = this.start();
    const id = this.nextId++;
    return new Promise((resolve, reject) => {
      const timer = setTimeout(
        () =>
          this.stop(
            new HttpError(503, {
              kind: 'unavailable',
              message: `The library took longer than ${this.limitMs / 1000} s; it was stopped. Try a smaller request.`,
            }),
          ),
        this.limitMs,
      );
      this.pending.set(id, { resolve, reject, timer });
      worker.postMessage({ ...request, id } as FindingsRequest);
    });
  }

  /** Ends the thread; what is still waiting is answered 503. */
  async close(): Promise<void> {
    this.stop(new HttpError(503, { kind: 'unavailable', message: 'The server is stopping.' }));
  }

  private start(): Worker {
    if (this.worker) return this.worker;
    const worker = new Worker(path.join(__dirname, 'findings-worker-entry.cjs'));
    worker.unref();
    worker.on('message', (reply: FindingsReply) => {
      const waiting = this.pending.get(reply.id);
      if (!waiting) return;
      this.pending.delete(reply.id);
      clearTimeout(waiting.timer);
      if (reply.ok) waiting.resolve(reply.value);
      else if (reply.failure.kind === 'http') waiting.reject(new HttpError(reply.failure.status, reply.failure.body));
      else if (reply.failure.kind === 'input') waiting.reject(new InputError(reply.failure.issues));
      else waiting.reject(new Error(reply.failure.message));
    });
    worker.on('error', (err) =>
      this.stop(new HttpError(503, { kind: 'unavailable', message: `The findings thread failed: ${err.message}` })),
    );
    worker.on('exit', () => {
      if (this.worker === worker)
        this.stop(new HttpError(503, { kind: 'unavailable', message: 'The findings thread stopped.' }));
    });
    this.worker = worker;
    return worker;
  }

  private stop(reason: Error): void {
    const worker = this.worker;
    this.worker = null;
    for (const [id, waiting] of this.pending) {
      clearTimeout(waiting.timer);
      waiting.reject(reason);
      this.pending.delete(id);
    }
    void worker?.terminate();
  }
}
