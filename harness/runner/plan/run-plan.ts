import path from 'node:path';
import type { OutcomeCounts, RunResult, SuiteTargetResult } from '../../../shared/run-result';
import type { Suite } from '../../../shared/schemas/suite-schema';
import type { TargetDescriptor } from '../../adapters/target-descriptor';
import { addTally } from '../evaluation/add-tally';
import { emptyClassCounts } from '../evaluation/empty-class-counts';
import { emptyCounts } from '../evaluation/empty-counts';
import { DEFAULT_TIME_LIMIT_MS } from '../evaluation/evaluate-pair';
import { cacheDir as userCacheDir } from '../../cache-dir';
import { PACKAGE_ROOT } from '../../package-root';
import { ReferenceCache } from '../reference-cache/reference-cache';
import { inProcessLane } from './in-process-lane';
import { mergePairResults } from './merge-pair-results';
import type { Plan, Slice } from './plan';
import { sliceFailure } from './slice-failure';
import { workerLane } from './worker-lane';

/** What a pass means, in every output. */
export const DISCLAIMER =
  'A pass means the target agreed with the reference at the points and paths listed, under the stated convention and tolerances; it is not a certification of the library, and other inputs may still fail.';

/**
 * Where the reference cache lives unless told otherwise: from source, the repository's ignored data
 * folder; for a CLI installed from its package (its root inside a node_modules folder, which may be
 * read-only, as a global install is), reference-cache/ in the user's cache folder (cache-dir.ts).
 */
export const DEFAULT_CACHE_DIR = PACKAGE_ROOT.split(path.sep).includes('node_modules')
  ? path.join(userCacheDir(), 'reference-cache')
  : path.join(PACKAGE_ROOT, '.data', 'reference-cache');

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
  /** The reference cache folder (default DEFAULT_CACHE_DIR); null keeps the cache in memory only. */
  cacheDir?: string | null;
  /** A cache object to use instead (tests count its reference calls); its folder is ignored for workers. */
  cache?: ReferenceCache;
  /** Worker threads; 0 (default) runs slices one after another in this process. */
  workers?: number;
  /** Per slice; evaluate-pair.ts's DEFAULT_TIME_LIMIT_MS by default. */
  sliceTimeLimitMs?: number;
  signal?: AbortSignal;
  onEvent?: (event: RunEvent) => void;
  maxFindings?: number;
  /** Replaces the pinned seed of every property check (and is reported in the result). */
  seed?: number | null;
  /** Run each suite's property checks against each target, with the first slice of the pair. */
  properties?: boolean;
  /** Version string of the tool, for the result. */
  toolVersion?: string;
}

interface SliceOutcome {
  slice: Slice;
  result: SuiteTargetResult;
}

/**
 * Runs a plan (docs/vocabulary.md): slices taken from one queue by lanes — this process, or one lane
 * per worker thread — each slice evaluated by evaluatePair (values, the pair's property checks
 * with its first slice, a time limit per slice), with progress events and cancellation. A
 * target that hangs past the limit, throws or crashes its worker turns that slice's points into
 * errors naming what happened; the run goes on with the next slice (a fresh target, a fresh
 * worker). Reference values come from the cache and what is computed is added to it, so a
 * repeated run computes none.
 *
 * In process, a time limit can stop a target that waits (a stdio program that does not answer:
 * it is killed) but not one that blocks the thread; use workers for in-process libraries that
 * might loop — a worker that does not answer within 6 s of its limit is terminated.
 */
export async function runPlan(plan: Plan, options: RunOptions = {}): Promise<RunResult> {
  const startedAt = new Date();
  const emit = options.onEvent ?? (() => undefined);
  const cacheDir = options.cacheDir === undefined ? DEFAULT_CACHE_DIR : options.cacheDir;
  const cache = options.cache ?? new ReferenceCache(cacheDir);
  const limit = options.sliceTimeLimitMs ?? DEFAULT_TIME_LIMIT_MS;
  const total = plan.slices.reduce((s, sl) => s + sl.points, 0);
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
  // The run's cancellation as the lanes see it: its reason is the text every cancelled point shows.
  const stop = new AbortController();
  const onCancel = () => {
    if (stop.signal.aborted) return;
    const reason = options.signal?.reason;
    const text = `cancelled: ${reason instanceof Error ? reason.message : String(reason ?? 'the run was cancelled')}`;
    emit({ type: 'cancelled', reason: text });
    stop.abort(new Error(text));
  };
  options.signal?.addEventListener('abort', onCancel, { once: true });
  if (options.signal?.aborted) onCancel();

  // A pair's property checks run once, with the slice of its first paths: the one mergePairResults takes them from.
  const firstSlices = new Map<string, Slice>();
  for (const slice of plan.slices) {
    const pair = `${slice.suite}×${slice.target}`;
    const known = firstSlices.get(pair);
    if (!known || (slice.paths[0] ?? 0) < (known.paths[0] ?? 0)) firstSlices.set(pair, slice);
  }
  const withProperties = new Set([...firstSlices.values()].map((slice) => slice.id));
  const workers = Math.max(0, Math.floor(options.workers ?? 0));
  const lanes =
    workers > 0 && plan.targets.every((t) => t.worker)
      ? Array.from({ length: Math.min(workers, Math.max(1, plan.slices.length)) }, () => workerLane(cacheDir, cache))
      : [inProcessLane(cache)];
  const queue = [...plan.slices];
  await Promise.all(
    lanes.map(async (lane) => {
      try {
        for (let slice = queue.shift(); slice; slice = queue.shift()) {
          const suite = plan.suites[slice.suite] as Suite;
          const descriptor = plan.targets[slice.target] as TargetDescriptor;
          const pathPoints = plan.pathPoints[slice.suite] ?? [];
          if (stop.signal.aborted) {
            const reason = (stop.signal.reason as Error).message;
            finish(slice, sliceFailure(suite, descriptor, slice.paths, pathPoints, reason, 'cancelled'), 0);
            continue;
          }
          emit({
            type: 'slice-start',
            slice: slice.id,
            suite: suite.id,
            target: descriptor.name,
            points: slice.points,
          });
          const started = Date.now();
          const evaluation = {
            timeLimitMs: limit,
            maxFindings: options.maxFindings,
            properties: options.properties && withProperties.has(slice.id) ? { seed: options.seed ?? null } : undefined,
          };
          const result = await lane.run({ slice, suite, descriptor, pathPoints, evaluation }, stop.signal);
          cache.flush();
          finish(slice, result, Date.now() - started);
        }
      } finally {
        await lane.close();
      }
    }),
  );
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
      results.push(
        mergePairResults(
          parts,
          suite.paths.length,
          (plan.pathPoints[s] ?? []).reduce((a, b) => a + b, 0),
        ),
      );
    }
  }
  const tally = { counts: emptyCounts(), byDiagnosis: {}, byClass: emptyClassCounts() };
  for (const r of results) addTally(tally, r);
  const { counts, byDiagnosis, byClass } = tally;
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
    byClass,
    results,
    reference: {
      computed: results.reduce((s, r) => s + r.reference.computed, 0),
      cached: results.reduce((s, r) => s + r.reference.cached, 0),
    },
  };
}
