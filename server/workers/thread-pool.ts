import { Worker } from 'node:worker_threads';
import { HttpError } from '../http/http-error';
import { InputError } from '../http/input-error';
import type { ThreadReply } from './thread-reply';
import type { WithoutId } from './without-id';

export interface ThreadPoolOptions {
  /** A CommonJS file that registers tsx and requires the TypeScript body (see findings-worker-entry.cjs). */
  entry: string;
  /** Threads at most; each runs one request at a time. */
  size: number;
  /** Requests of one lane waiting for a thread at most; one more is refused with `full()`. */
  queueLimit: number;
  /** The answer to a request that finds its lane's queue full (503 naming what is busy). */
  full: () => HttpError;
  /**
   * Threads each lane may hold at once (a lane not named may hold all `size`). A waiting request
   * whose lane is at its limit lets the next request of another lane go first, so a lane of long
   * requests never holds every thread while a short one waits behind it.
   */
  laneLimits?: Readonly<Record<string, number>>;
}

/** The lane of a request that names none. */
const ANY_LANE = 'any';

type Task = {
  message: object;
  lane: string;
  limitMs: number;
  overLimit: () => Error;
  resolve: (value: unknown) => void;
  reject: (err: Error) => void;
};
type Slot = {
  worker: Worker;
  ready: boolean;
  task: (Task & { id: number; timer: ReturnType<typeof setTimeout> }) | null;
};

/**
 * A small pool of worker threads for computations that must not run on the server's thread
 * (a library's cut map, a reference table against an expensive subject). Threads start on
 * demand, never keep the process alive, and run one request each; the rest wait in a bounded
 * queue, and a request beyond it is refused at once. A request that passes its time limit
 * stops its thread (the only way to end a synchronous loop) and is answered with `overLimit()`;
 * a thread that dies answers 503; either way the next request gets a fresh thread.
 */
export class ThreadPool<R extends { id: number }> {
  private readonly slots: Slot[] = [];
  private readonly queue: Task[] = [];
  private nextId = 1;
  private closed = false;

  constructor(private readonly options: ThreadPoolOptions) {}

  run(request: WithoutId<R>, limitMs: number, overLimit: () => Error, lane = ANY_LANE): Promise<unknown> {
    const waiting = this.queue.filter((t) => t.lane === lane).length;
    // A request can start at once only if its lane is under its limit as well as a thread being free:
    // an idle thread kept for the other lanes is no room for this one, and must not unbound its queue.
    const canStart = this.running(lane) < this.laneLimit(lane) && this.idleSlotOrRoom();
    if (waiting >= this.options.queueLimit && !canStart) return Promise.reject(this.options.full());
    return new Promise((resolve, reject) => {
      this.closed = false;
      this.queue.push({ message: request, lane, limitMs, overLimit, resolve, reject });
      this.dispatch();
    });
  }

  /** Threads computing now. */
  get busy(): number {
    return this.slots.filter((s) => s.task).length;
  }

  /** Threads started and ready for a request. */
  get ready(): number {
    return this.slots.filter((s) => s.ready).length;
  }

  /** Requests waiting for a thread. */
  get waiting(): number {
    return this.queue.length;
  }

  /** Ends every thread; what is still running or waiting is answered 503. */
  async close(): Promise<void> {
    this.closed = true;
    const stopping = new HttpError(503, { kind: 'unavailable', message: 'The server is stopping.' });
    for (const task of this.queue.splice(0)) task.reject(stopping);
    await Promise.all([...this.slots].map((slot) => this.retire(slot, stopping)));
  }

  private idleSlotOrRoom(): boolean {
    return this.slots.length < this.options.size || this.slots.some((s) => !s.task);
  }

  /**
   * Gives waiting requests to ready idle threads, and starts threads for the rest up to `size`.
   * A request's time limit starts when its thread has loaded its code (tsx and the harness take
   * 0.5–3 s on the shared 2-core machine), so start-up never counts against a request's budget.
   */
  private dispatch(): void {
    if (this.closed) return;
    const starting = this.slots.filter((s) => !s.ready).length;
    for (let more = this.queue.length - starting; more > 0 && this.slots.length < this.options.size; more -= 1)
      this.spawn();
    while (this.queue.length > 0) {
      const slot = this.slots.find((s) => s.ready && !s.task);
      if (!slot) return;
      // The oldest request whose lane has a thread to spare; none when every lane waiting is at its limit.
      const next = this.queue.findIndex((t) => this.running(t.lane) < this.laneLimit(t.lane));
      if (next < 0) return;
      const task = this.queue.splice(next, 1)[0]!;
      const id = this.nextId++;
      const timer = setTimeout(() => void this.retire(slot, task.overLimit()), task.limitMs);
      slot.task = { ...task, id, timer };
      slot.worker.postMessage({ ...task.message, id });
    }
  }

  private running(lane: string): number {
    return this.slots.filter((s) => s.task?.lane === lane).length;
  }

  private laneLimit(lane: string): number {
    return this.options.laneLimits?.[lane] ?? this.options.size;
  }

  private spawn(): Slot {
    const worker = new Worker(this.options.entry);
    worker.unref();
    const slot: Slot = { worker, ready: false, task: null };
    worker.on('message', (reply: ThreadReply | 'ready') => {
      if (reply === 'ready') {
        slot.ready = true;
        this.dispatch();
        return;
      }
      const task = slot.task;
      if (!task || task.id !== reply.id) return;
      clearTimeout(task.timer);
      slot.task = null;
      if (reply.ok) task.resolve(reply.value);
      else if (reply.failure.kind === 'http') task.reject(new HttpError(reply.failure.status, reply.failure.body));
      else if (reply.failure.kind === 'input') task.reject(new InputError(reply.failure.issues));
      else task.reject(new Error(reply.failure.message));
      this.dispatch();
    });
    worker.on(
      'error',
      (err) =>
        void this.retire(
          slot,
          new HttpError(503, { kind: 'unavailable', message: `A computing thread failed: ${err.message}` }),
        ),
    );
    worker.on(
      'exit',
      () => void this.retire(slot, new HttpError(503, { kind: 'unavailable', message: 'A computing thread stopped.' })),
    );
    this.slots.push(slot);
    return slot;
  }

  /** Stops a slot's thread, answers its request with `reason`, and lets the queue move on. */
  private async retire(slot: Slot, reason: Error): Promise<void> {
    const at = this.slots.indexOf(slot);
    if (at < 0) return;
    this.slots.splice(at, 1);
    const task = slot.task;
    slot.task = null;
    if (task) {
      clearTimeout(task.timer);
      task.reject(reason);
    }
    this.dispatch();
    await slot.worker.terminate();
  }
}
