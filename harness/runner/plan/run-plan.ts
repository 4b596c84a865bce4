import path from 'node:path';
import { Worker } from 'node:worker_threads';
import type { DiagnosisKind } from '../../../shared/diagnosis';
import type { OutcomeCounts, PropertyOutcomeSummary, RunResult, SuiteTargetResult } from '../../../shared/run-result';
import type { Suite } from '../../../shared/schemas/suite-schema';
import type { Target } from '../../adapters/target';
import { evaluateSuite } from '../evaluation/evaluate-suite';
import { mergePairResults } from './merge-pair-results';
import type { Plan, Slice } from './plan';
import { ReferenceCache, type CacheRecords } from '../reference-cache/reference-cache';
import { sliceFailure } from './slice-failure';
import type { WorkerReply, WorkerRequest } from '../slice-worker/slice-worker-messages';
import type { TargetDescriptor } from '../../adapters/target-descriptor';

/** What a pass means, in every output. */
export const DISCLAIMER =
  'A pass means the target agreed with the reference at the points and paths listed, under the stated convention and tolerances; it is not a certification of the library, and other inputs may still fail.';

/** Where the reference cache lives unless told otherwise (the project's ignored data folder). */
export const DEFAULT_CACHE_DIR = path.resolve(__dirname, '..', '..', '..', '.data', 'reference-cache');
/** A slice gets two minutes: the largest demo slice takes under 2 s cold (bench:harness). */
export const DEFAULT_SLICE_TIME_LIMIT_MS = 120_000;
/** How long a worker thread may take to load tsx, the engine and mathjs (~1–2 s here) before it counts as failed. */
const STARTUP_MS = 60_000;
/** After aborting a slice, how long to wait for it to wind down before giving up on it (and, in a worker, terminating it). */
const GRACE_MS = 2_000;

export type RunEvent =
  | { type: 'plan'; slices: number; points: number; suites: number; targets: number }
  | { type: 'slice-start'; slice: number; suite: string; target: string; points: number }
  | {
      type: 'slice-end';
      slice: number;
      suite: string;
      target: string;
      status: SuiteTargetResult['status'];
      counts: OutcomeCounts;
      durationMs: number;
    }
  | { type: 'progress'; done: number; total: number }
  | { type: 'cancelled'; reason: string };

export interface RunOptions {
  /** The reference cache folder (default .data/reference-cache); null keeps the cache in memory only. */
  cacheDir?: string | null;
  /** A cache object to use instead (tests count its reference calls); its folder is ignored for workers. */
  cache?: ReferenceCache;
  /** Worker threads; 0 (default) runs slices one after another in this process. */
  workers?: number;
  sliceTimeLimitMs?: number;
  signal?: AbortSignal;
  onEvent?: (event: RunEvent) => void;
  maxFindings?: number;
  seed?: number | null;
  /** Property checks per suite × target, run in this process after its slices (the properties work plugs in here). */
  properties?: (suite: Suite, target: Target, seed: number | null) => Promise<PropertyOutcomeSummary[]>;
  /** Version string of the tool, for the result. */
  toolVersion?: string;
}

interface SliceOutcome {
  slice: Slice;
  result: SuiteTargetResult;
}

/**
 * Runs a plan (docs/vocabulary.md): slices taken from a queue, in this process or by worker threads,
 * with progress events, cancellation and a time limit per slice. A target that hangs past the
 * limit, throws or crashes its worker turns that slice's points into errors naming what
 * happened; the run goes on with the next slice (a fresh target, a fresh worker). Reference
 * values come from the cache and what is computed is added to it, so a repeated run computes none.
 *
 * In process, a time limit can stop a target that waits (a stdio program that does not answer:
 * it is killed) but not one that blocks the thread; use workers for in-process libraries that
 * might loop — a worker that does not wind down within 2 s of the abort is terminated.
 */
export async function runPlan(plan: Plan, options: RunOptions = {}): Promise<RunResult> {
  const startedAt = new Date();
  const emit = options.onEvent ?? (() => undefined);
  const cacheDir = options.cacheDir === undefined ? DEFAULT_CACHE_DIR : options.cacheDir;
  const cache = options.cache ?? new ReferenceCache(cacheDir);
  const limit = options.sliceTimeLimitMs ?? DEFAULT_SLICE_TIME_LIMIT_MS;
  const total = plan.slices.reduce((s, sh) => s + sh.points, 0);
  emit({
    type: 'plan',
    slices: plan.slices.length,
    points: total,
    suites: plan.suites.length,
    targets: plan.targets.length,
  });
  let done = 0;
  const outcomes: SliceOutcome[] = [];
  const finish = (slice: Slice, result: SuiteTargetResult, ms: number) => {
    outcomes.push({ slice, result });
    done += slice.points;
    emit({
      type: 'slice-end',
      slice: slice.id,
      suite: result.suite.id,
      target: result.target.name,
      status: result.status,
      counts: result.counts,
      durationMs: ms,
    });
    emit({ type: 'progress', done, total });
  };
  const cancelledReason = () =>
    `cancelled: ${options.signal?.reason instanceof Error ? options.signal.reason.message : String(options.signal?.reason ?? 'the run was cancelled')}`;
  let cancelEmitted = false;
  const onCancel = () => {
    if (!cancelEmitted) emit({ type: 'cancelled', reason: cancelledReason() });
    cancelEmitted = true;
  };
  options.signal?.addEventListener('abort', onCancel, { once: true });
  if (options.signal?.aborted) onCancel();

  const workers = Math.max(0, Math.floor(options.workers ?? 0));
  const workerable = workers > 0 && plan.targets.every((t) => t.worker);
  if (workerable) await runInWorkers(plan, workers, limit, cacheDir, cache, options, emit, finish, cancelledReason);
  else await runInProcess(plan, limit, cache, options, emit, finish, cancelledReason);
  options.signal?.removeEventListener('abort', onCancel);
  cache.flush();

  // One result per suite × target, in plan order.
  const results: SuiteTargetResult[] = [];
  for (let s = 0; s < plan.suites.length; s++) {
    for (let t = 0; t < plan.targets.length; t++) {
      const parts = outcomes
        .filter((o) => o.slice.suite === s && o.slice.target === t)
        .map((o) => ({ paths: o.slice.paths, result: o.result }));
      if (parts.length === 0) continue;
      const suite = plan.suites[s] as Suite;
      const merged = mergePairResults(
        parts,
        suite.paths.length,
        (plan.pathPoints[s] ?? []).reduce((a, b) => a + b, 0),
      );
      if (options.properties && !options.signal?.aborted && merged.status !== 'cancelled') {
        const target = (plan.targets[t] as TargetDescriptor).open();
        try {
          merged.properties = await options.properties(suite, target, options.seed ?? null);
          merged.checked.properties = {
            listed: suite.properties.map((p) => p.law),
            run: true,
            note: `${merged.properties.length} property check(s) run`,
          };
          if (merged.status === 'pass' && merged.properties.some((p) => p.kind === 'failed')) merged.status = 'fail';
        } catch (e) {
          merged.errors.push(`property checks: ${e instanceof Error ? e.message : String(e)}`);
          merged.status = 'error';
        } finally {
          await target.close();
        }
      } else if (suite.properties.length > 0) {
        merged.checked.properties = {
          listed: suite.properties.map((p) => p.law),
          run: false,
          note: 'listed in the suite but not run by this run',
        };
      }
      results.push(merged);
    }
  }
  const counts: OutcomeCounts = { pass: 0, fail: 0, error: 0, skipped: 0 };
  const byDiagnosis: Partial<Record<DiagnosisKind, number>> = {};
  for (const r of results) {
    for (const k of Object.keys(counts) as (keyof OutcomeCounts)[]) counts[k] += r.counts[k];
    for (const [kind, n] of Object.entries(r.byDiagnosis))
      byDiagnosis[kind as DiagnosisKind] = (byDiagnosis[kind as DiagnosisKind] ?? 0) + (n ?? 0);
  }
  const statuses = results.map((r) => r.status);
  return {
    tool: { name: 'sheetkeeper', version: options.toolVersion ?? '0.1.0' },
    startedAt: startedAt.toISOString(),
    finishedAt: new Date().toISOString(),
    seed: options.seed ?? null,
    status:
      options.signal?.aborted || statuses.includes('cancelled')
        ? 'cancelled'
        : statuses.includes('error')
          ? 'error'
          : statuses.includes('fail')
            ? 'fail'
            : 'pass',
    disclaimer: DISCLAIMER,
    plan: {
      suites: plan.suites.map((s) => ({ id: s.id, version: s.version })),
      targets: plan.targets.map((t) => t.name),
      slices: plan.slices.length,
    },
    counts,
    byDiagnosis,
    results,
    reference: {
      computed: results.reduce((s, r) => s + r.reference.computed, 0),
      cached: results.reduce((s, r) => s + r.reference.cached, 0),
    },
  };
}

async function runInProcess(
  plan: Plan,
  limit: number,
  cache: ReferenceCache,
  options: RunOptions,
  emit: (e: RunEvent) => void,
  finish: (slice: Slice, result: SuiteTargetResult, ms: number) => void,
  cancelledReason: () => string,
): Promise<void> {
  const open = new Map<number, Target>();
  const targetFor = (t: number): Target => {
    let target = open.get(t);
    if (!target) open.set(t, (target = (plan.targets[t] as TargetDescriptor).open()));
    return target;
  };
  try {
    for (const slice of plan.slices) {
      const suite = plan.suites[slice.suite] as Suite;
      const ref = plan.targets[slice.target] as TargetDescriptor;
      const pathPoints = plan.pathPoints[slice.suite] ?? [];
      if (options.signal?.aborted) {
        finish(slice, sliceFailure(suite, ref, slice.paths, pathPoints, cancelledReason(), 'cancelled'), 0);
        continue;
      }
      emit({ type: 'slice-start', slice: slice.id, suite: suite.id, target: ref.name, points: slice.points });
      const started = Date.now();
      const controller = new AbortController();
      const onRunAbort = () => controller.abort(new Error(cancelledReason()));
      options.signal?.addEventListener('abort', onRunAbort, { once: true });
      let timedOut = false;
      const timer = setTimeout(() => {
        timedOut = true;
        controller.abort(new Error(`the slice exceeded its time limit of ${limit} ms`));
      }, limit);
      const target = targetFor(slice.target);
      const work = evaluateSuite(suite, target, {
        cache,
        signal: controller.signal,
        paths: slice.paths,
        maxFindings: options.maxFindings,
      }).then(
        (r) => ({ ok: true as const, r }),
        (e: unknown) => ({ ok: false as const, e }),
      );
      const aborted = new Promise<'aborted'>((resolve) =>
        controller.signal.addEventListener('abort', () => resolve('aborted'), { once: true }),
      );
      const first = await Promise.race([work, aborted]);
      clearTimeout(timer);
      options.signal?.removeEventListener('abort', onRunAbort);
      let result: SuiteTargetResult;
      if (first === 'aborted' || controller.signal.aborted) {
        // Kill what the target holds (a stdio program that does not answer), let the work wind
        // down for a moment, and give later slices a fresh target.
        await Promise.race([target.close(), delay(GRACE_MS)]);
        await Promise.race([work, delay(GRACE_MS)]);
        open.delete(slice.target);
        const reason = timedOut
          ? `${ref.name} did not finish within the slice time limit of ${limit} ms; the slice was stopped and the target restarted`
          : cancelledReason();
        result = sliceFailure(suite, ref, slice.paths, pathPoints, reason, timedOut ? 'error' : 'cancelled');
      } else if (!first.ok) {
        await target.close().catch(() => undefined);
        open.delete(slice.target);
        result = sliceFailure(
          suite,
          ref,
          slice.paths,
          pathPoints,
          `the slice failed: ${first.e instanceof Error ? first.e.message : String(first.e)}`,
          'error',
        );
      } else {
        result = first.r;
      }
      cache.flush();
      finish(slice, result, Date.now() - started);
    }
  } finally {
    await Promise.all([...open.values()].map((t) => Promise.race([t.close(), delay(GRACE_MS)]).catch(() => undefined)));
  }
}

async function runInWorkers(
  plan: Plan,
  count: number,
  limit: number,
  cacheDir: string | null,
  cache: ReferenceCache,
  options: RunOptions,
  emit: (e: RunEvent) => void,
  finish: (slice: Slice, result: SuiteTargetResult, ms: number) => void,
  cancelledReason: () => string,
): Promise<void> {
  const queue = [...plan.slices];
  const entry = path.join(__dirname, '..', 'slice-worker', 'slice-worker-entry.cjs');
  const lane = async (): Promise<void> => {
    let worker: Worker | null = null;
    // A worker counts as started once it has loaded the engine and said so; start-up is not part of any slice's time.
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
    try {
      for (let slice = queue.shift(); slice; slice = queue.shift()) {
        const suite = plan.suites[slice.suite] as Suite;
        const ref = plan.targets[slice.target] as TargetDescriptor;
        const pathPoints = plan.pathPoints[slice.suite] ?? [];
        if (options.signal?.aborted) {
          finish(slice, sliceFailure(suite, ref, slice.paths, pathPoints, cancelledReason(), 'cancelled'), 0);
          continue;
        }
        emit({ type: 'slice-start', slice: slice.id, suite: suite.id, target: ref.name, points: slice.points });
        const started = Date.now();
        try {
          worker ??= await spawn();
        } catch (e) {
          finish(
            slice,
            sliceFailure(suite, ref, slice.paths, pathPoints, e instanceof Error ? e.message : String(e), 'error'),
            Date.now() - started,
          );
          continue;
        }
        const w: Worker = worker;
        const request: WorkerRequest = {
          type: 'slice',
          slice: slice.id,
          suite,
          paths: slice.paths,
          target: { name: ref.name, spec: ref.worker as NonNullable<TargetDescriptor['worker']> },
          maxFindings: options.maxFindings,
        };
        const outcome = await new Promise<
          | { kind: 'result'; result: SuiteTargetResult; records: CacheRecords[] }
          | { kind: 'failed'; reason: string; terminate: boolean; status: 'error' | 'cancelled' }
        >((resolve) => {
          let settled = false;
          const settle = (v: Parameters<typeof resolve>[0]) => {
            if (settled) return;
            settled = true;
            clearTimeout(timer);
            if (stopping) clearTimeout(stopping.grace);
            options.signal?.removeEventListener('abort', onRunAbort);
            w.off('message', onMessage);
            w.off('error', onError);
            w.off('exit', onExit);
            resolve(v);
          };
          let stopping: { reason: string; status: 'error' | 'cancelled'; grace: ReturnType<typeof setTimeout> } | null =
            null;
          const stop = (reason: string, status: 'error' | 'cancelled') => {
            if (stopping) return;
            // Ask the worker to abort and close its targets (killing a stdio program); terminate it if it does not answer.
            w.postMessage({ type: 'abort' } satisfies WorkerRequest);
            stopping = {
              reason,
              status,
              grace: setTimeout(() => settle({ kind: 'failed', reason, terminate: true, status }), GRACE_MS),
            };
          };
          const timer = setTimeout(
            () =>
              stop(
                `${ref.name} did not finish within the slice time limit of ${limit} ms; the slice was stopped and the target restarted`,
                'error',
              ),
            limit,
          );
          const onRunAbort = () => stop(cancelledReason(), 'cancelled');
          options.signal?.addEventListener('abort', onRunAbort, { once: true });
          const onMessage = (m: WorkerReply) => {
            if (stopping) {
              if (m.type === 'aborted') {
                clearTimeout(stopping.grace);
                settle({ kind: 'failed', reason: stopping.reason, terminate: false, status: stopping.status });
              }
              return;
            }
            if (m.type === 'result' && m.slice === slice.id)
              settle({ kind: 'result', result: m.result, records: m.records });
            else if (m.type === 'failed' && m.slice === slice.id)
              settle({ kind: 'failed', reason: `the slice failed: ${m.error}`, terminate: false, status: 'error' });
          };
          const onError = (e: Error) =>
            settle({ kind: 'failed', reason: `the worker crashed: ${e.message}`, terminate: true, status: 'error' });
          const onExit = (code: number) =>
            settle({ kind: 'failed', reason: `the worker exited with code ${code}`, terminate: true, status: 'error' });
          w.on('message', onMessage);
          w.on('error', onError);
          w.on('exit', onExit);
          w.postMessage(request);
        });
        if (outcome.kind === 'result') {
          cache.absorb(outcome.records);
          cache.computed += outcome.result.reference.computed;
          cache.cached += outcome.result.reference.cached;
          cache.flush();
          finish(slice, outcome.result, Date.now() - started);
        } else {
          if (outcome.terminate) {
            await w.terminate().catch(() => undefined);
            worker = null;
          }
          finish(
            slice,
            sliceFailure(suite, ref, slice.paths, pathPoints, outcome.reason, outcome.status),
            Date.now() - started,
          );
        }
      }
    } finally {
      if (worker) {
        const w: Worker = worker;
        w.postMessage({ type: 'close' } satisfies WorkerRequest);
        await Promise.race([new Promise((r) => w.once('exit', r)), delay(GRACE_MS)]);
        await w.terminate().catch(() => undefined);
      }
    }
  };
  await Promise.all(Array.from({ length: Math.min(count, Math.max(1, plan.slices.length)) }, lane));
}

function delay(ms: number): Promise<void> {
  return new Promise((resolve) => {
    const t = setTimeout(resolve, ms) as unknown as { unref?: () => void };
    t.unref?.();
  });
}
