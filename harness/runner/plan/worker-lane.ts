import path from 'node:path';
import { Worker } from 'node:worker_threads';
import type { SuiteTargetResult } from '../../../shared/run-result';
import type { TargetDescriptor } from '../../adapters/target-descriptor';
import { errorText } from '../evaluation/error-text';
import { timeLimitReason } from '../evaluation/time-limit-reason';
import { unrefDelay } from '../evaluation/unref-delay';
import type { CacheRecords, ReferenceCache } from '../reference-cache/reference-cache';
import type { WorkerReply, WorkerRequest } from '../slice-worker/slice-worker-messages';
import { sliceFailure } from './slice-failure';
import type { SliceLane } from './slice-lane';

/** How long a worker thread may take to load tsx, the engine and mathjs (~1–2 s here) before it counts as failed. */
const STARTUP_MS = 60_000;
/**
 * How long past its time limit, or past a cancellation, a worker may take to answer before it is
 * terminated: evaluatePair in the worker stops its slice and answers within 2 × 2 s (closing the
 * target, winding down); a worker whose library blocks its thread never answers.
 */
const BACKSTOP_MS = 6_000;
/** How long a worker may take to close its targets and exit at the end of a run. */
const CLOSE_MS = 2_000;

type Outcome =
  | { kind: 'result'; result: SuiteTargetResult; records: CacheRecords[] }
  | { kind: 'failed'; reason: string; status: 'error' | 'cancelled'; terminate: boolean };

/**
 * Slices evaluated one after another on one worker thread (slice-worker.ts), which runs
 * evaluatePair itself, time limit included. This side only steps in for what the worker cannot
 * answer: a worker that does not start, crashes or exits gives an error result; one that does
 * not answer within BACKSTOP_MS of its limit or of a cancellation (a library blocking its thread)
 * is terminated. The next slice then starts a fresh worker; start-up is no part of a slice's time.
 */
export function workerLane(cacheDir: string | null, cache: ReferenceCache): SliceLane {
  // Code found from code, not a shipped file: the build puts the .cjs entry beside the compiled
  // modules (docs/cli-package.md), so this path holds from source and compiled alike.
  const entry = path.join(__dirname, '..', 'slice-worker', 'slice-worker-entry.cjs');
  let worker: Worker | null = null;
  const spawn = async (): Promise<Worker> => {
    const w = new Worker(entry, { workerData: { cacheDir } });
    const ready = await new Promise<true | string>((resolve) => {
      const timer = setTimeout(() => resolve(`the worker did not start within ${STARTUP_MS} ms`), STARTUP_MS);
      w.once('message', (m: WorkerReply) => {
        clearTimeout(timer);
        resolve(m.type === 'ready' ? true : `the worker said ${m.type} before it was ready`);
      });
      w.once('error', (e) => {
        clearTimeout(timer);
        resolve(`the worker failed to start: ${e.message}`);
      });
    });
    if (ready !== true) {
      await w.terminate().catch(() => undefined);
      throw new Error(ready);
    }
    return w;
  };

  return {
    async run({ slice, suite, descriptor, pathPoints, evaluation }, signal) {
      const failed = (reason: string, status: 'error' | 'cancelled') =>
        sliceFailure(suite, descriptor, slice.paths, pathPoints, reason, status);
      let w: Worker;
      try {
        w = worker ??= await spawn();
      } catch (e) {
        return failed(errorText(e), 'error');
      }
      const outcome = await new Promise<Outcome>((resolve) => {
        const timers: ReturnType<typeof setTimeout>[] = [];
        let settled = false;
        const settle = (o: Outcome) => {
          if (settled) return;
          settled = true;
          for (const t of timers) clearTimeout(t);
          signal.removeEventListener('abort', onCancel);
          w.off('message', onMessage);
          w.off('error', onError);
          w.off('exit', onExit);
          resolve(o);
        };
        const onCancel = () => {
          const reason = errorText(signal.reason);
          w.postMessage({ type: 'abort', reason } satisfies WorkerRequest);
          timers.push(
            setTimeout(() => settle({ kind: 'failed', reason, status: 'cancelled', terminate: true }), BACKSTOP_MS),
          );
        };
        const onMessage = (m: WorkerReply) => {
          if (m.type === 'result' && m.slice === slice.id)
            settle({ kind: 'result', result: m.result, records: m.records });
          else if (m.type === 'failed' && m.slice === slice.id)
            settle({ kind: 'failed', reason: `the evaluation failed: ${m.error}`, status: 'error', terminate: false });
        };
        const onError = (e: Error) =>
          settle({ kind: 'failed', reason: `the worker crashed: ${e.message}`, status: 'error', terminate: true });
        const onExit = (code: number) =>
          settle({ kind: 'failed', reason: `the worker exited with code ${code}`, status: 'error', terminate: true });
        timers.push(
          setTimeout(
            () =>
              settle({
                kind: 'failed',
                reason: timeLimitReason(descriptor.name, evaluation.timeLimitMs),
                status: 'error',
                terminate: true,
              }),
            evaluation.timeLimitMs + BACKSTOP_MS,
          ),
        );
        w.on('message', onMessage);
        w.on('error', onError);
        w.on('exit', onExit);
        w.postMessage({
          type: 'slice',
          slice: slice.id,
          suite,
          paths: slice.paths,
          pathPoints,
          target: {
            name: descriptor.name,
            library: descriptor.library,
            version: descriptor.version,
            settings: descriptor.settings,
            spec: descriptor.worker as NonNullable<TargetDescriptor['worker']>,
          },
          evaluation,
        } satisfies WorkerRequest);
        signal.addEventListener('abort', onCancel, { once: true });
        if (signal.aborted) onCancel();
      });
      if (outcome.kind === 'result') {
        cache.absorb(outcome.records);
        cache.computed += outcome.result.reference.computed;
        cache.cached += outcome.result.reference.cached;
        return outcome.result;
      }
      if (outcome.terminate) {
        await w.terminate().catch(() => undefined);
        worker = null;
      }
      return failed(outcome.reason, outcome.status);
    },
    async close() {
      if (!worker) return;
      const w: Worker = worker;
      worker = null;
      w.postMessage({ type: 'close' } satisfies WorkerRequest);
      await Promise.race([new Promise((r) => w.once('exit', r)), unrefDelay(CLOSE_MS)]);
      await w.terminate().catch(() => undefined);
    },
  };
}
