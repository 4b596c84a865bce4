import path from 'node:path';
import type { DiagnosisKind } from '../../shared/diagnosis';
import type { OutcomeCounts, RunResult, SuiteTargetResult } from '../../shared/run-result';
import type { Suite } from '../../shared/schemas/suite-schema';
import { DEFAULT_TIME_LIMIT_MS } from './evaluate-pair';
import { inProcessLane } from './in-process-lane';
import { mergePairResults } from './merge-pair-results';
import type { Plan, Shard } from './plan';
import { ReferenceCache } from './reference-cache';
import { shardFailure } from './shard-failure';
import type { TargetRef } from './target-ref';
import { workerLane } from './worker-lane';

/** What a pass means, in every output. */
export const DISCLAIMER =
  'A pass means the target agreed with the reference at the points and paths listed, under the stated convention and tolerances; it is not a certification of the library, and other inputs may still fail.';

/** Where the reference cache lives unless told otherwise (the project's ignored data folder). */
export const DEFAULT_CACHE_DIR = path.resolve(__dirname, '..', '..', '.data', 'reference-cache');

export type RunEvent =
  | { type: 'plan'; shards: number; points: number; suites: number; targets: number }
  | { type: 'shard-start'; shard: number; suite: string; target: string; points: number }
  | {
      type: 'shard-end';
      shard: number;
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
  /** Worker threads; 0 (default) runs shards one after another in this process. */
  workers?: number;
  /** Per shard; evaluate-pair.ts's DEFAULT_TIME_LIMIT_MS by default. */
  shardTimeLimitMs?: number;
  signal?: AbortSignal;
  onEvent?: (event: RunEvent) => void;
  maxFindings?: number;
  /** Replaces the pinned seed of every property check (and is reported in the result). */
  seed?: number | null;
  /** Run each suite's property checks against each target, with the first shard of the pair. */
  properties?: boolean;
  /** Version string of the tool, for the result. */
  toolVersion?: string;
}

interface ShardOutcome {
  shard: Shard;
  result: SuiteTargetResult;
}

/**
 * Runs a plan (docs/vocabulary.md): shards taken from one queue by lanes — this process, or one lane
 * per worker thread — each shard evaluated by evaluatePair (values, the pair's property checks
 * with its first shard, a time limit per shard), with progress events and cancellation. A
 * target that hangs past the limit, throws or crashes its worker turns that shard's points into
 * errors naming what happened; the run goes on with the next shard (a fresh target, a fresh
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
  const limit = options.shardTimeLimitMs ?? DEFAULT_TIME_LIMIT_MS;
  const total = plan.shards.reduce((s, sh) => s + sh.points, 0);
  emit({
    type: 'plan',
    shards: plan.shards.length,
    points: total,
    suites: plan.suites.length,
    targets: plan.targets.length,
  });
  let done = 0;
  const outcomes: ShardOutcome[] = [];
  const finish = (shard: Shard, result: SuiteTargetResult, ms: number) => {
    outcomes.push({ shard, result });
    done += shard.points;
    emit({
      type: 'shard-end',
      shard: shard.id,
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

  // A pair's property checks run once, with the shard of its first paths: the one mergePairResults takes them from.
  const firstShards = new Map<string, Shard>();
  for (const shard of plan.shards) {
    const pair = `${shard.suite}×${shard.target}`;
    const known = firstShards.get(pair);
    if (!known || (shard.paths[0] ?? 0) < (known.paths[0] ?? 0)) firstShards.set(pair, shard);
  }
  const withProperties = new Set([...firstShards.values()].map((shard) => shard.id));
  const workers = Math.max(0, Math.floor(options.workers ?? 0));
  const lanes =
    workers > 0 && plan.targets.every((t) => t.worker)
      ? Array.from({ length: Math.min(workers, Math.max(1, plan.shards.length)) }, () => workerLane(cacheDir, cache))
      : [inProcessLane(cache)];
  const queue = [...plan.shards];
  await Promise.all(
    lanes.map(async (lane) => {
      try {
        for (let shard = queue.shift(); shard; shard = queue.shift()) {
          const suite = plan.suites[shard.suite] as Suite;
          const ref = plan.targets[shard.target] as TargetRef;
          const pathPoints = plan.pathPoints[shard.suite] ?? [];
          if (stop.signal.aborted) {
            const reason = (stop.signal.reason as Error).message;
            finish(shard, shardFailure(suite, ref, shard.paths, pathPoints, reason, 'cancelled'), 0);
            continue;
          }
          emit({ type: 'shard-start', shard: shard.id, suite: suite.id, target: ref.name, points: shard.points });
          const started = Date.now();
          const evaluation = {
            timeLimitMs: limit,
            maxFindings: options.maxFindings,
            properties: options.properties && withProperties.has(shard.id) ? { seed: options.seed ?? null } : undefined,
          };
          const result = await lane.run({ shard, suite, ref, pathPoints, evaluation }, stop.signal);
          cache.flush();
          finish(shard, result, Date.now() - started);
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
        .filter((o) => o.shard.suite === s && o.shard.target === t)
        .map((o) => ({ paths: o.shard.paths, result: o.result }));
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
      shards: plan.shards.length,
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
