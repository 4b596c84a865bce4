import type { SuiteTargetResult } from '../../../shared/run-result';
import type { Suite } from '../../../shared/schemas/suite-schema';
import type { Target } from '../../adapters/target';
import type { TargetDescriptor } from '../../adapters/target-descriptor';
import { checkSuiteProperties } from '../../properties/check-suite-properties';
import { sliceFailure } from '../plan/slice-failure';
import { suitePathPoints } from '../plan/suite-path-points';
import type { ReferenceCache } from '../reference-cache/reference-cache';
import { errorText } from './error-text';
import { evaluateSuite } from './evaluate-suite';
import { pairStatus } from './pair-status';
import { propertiesNotRun } from './properties-not-run';
import { timeLimitReason } from './time-limit-reason';
import { unrefDelay } from './unref-delay';

/**
 * How long one evaluation may take, a CLI slice or a server shard (a whole suite): two minutes.
 * The largest demo slice takes under 2 s cold (bench:harness); the slowest demo suite as one
 * server shard, values and property checks with no cached reference values, took 10.8 s against
 * complex.js 2.4.3 (pow-complex-principal-ccw; the next, acos-principal-ccw, 4.2 s). The server
 * used to allow 300 s: a hung target now frees its queue worker after 2 minutes.
 */
export const DEFAULT_TIME_LIMIT_MS = 120_000;
/** After stopping an evaluation, how long to wait for its target to close and its work to wind down. */
const GRACE_MS = 2_000;

export interface EvaluatePairOptions {
  /** Reference values by point bits; without one, a private in-memory cache is used. */
  cache?: ReferenceCache;
  /** Evaluate only these paths (indices into suite.paths); all by default. */
  paths?: readonly number[];
  /** Points per path of the suite, for an error result (a plan has them); counted from the suite when absent. */
  pathPoints?: readonly number[];
  /** Failing points listed in full per path (all are counted). */
  maxFindings?: number;
  /** Run the suite's property checks after the values: with their pinned seeds, or with `seed` for all of them. */
  properties?: { seed: number | null };
  timeLimitMs?: number;
  /** Cancels the evaluation: its points become skipped, with the reason's message as the reason. */
  signal?: AbortSignal;
}

/**
 * One suite × target evaluation, as the CLI runner (in process and in worker threads) and the
 * server's shard executor run it: opens the target, evaluates the values (evaluateSuite), then,
 * when asked, the suite's property checks, all within one time limit. A target that cannot be
 * opened, throws, or runs past the limit, and a cancellation, give one error result
 * (sliceFailure) naming what happened; the target is then closed — which also kills a stdio
 * program that does not answer — and `target` is null, so the caller opens a fresh one next
 * time. Otherwise `target` is the open target, for the caller to reuse or close.
 *
 * A time limit stops a target that waits, not one that blocks the thread: run such libraries
 * in a worker thread, which runPlan terminates when it does not answer.
 */
export async function evaluatePair(
  suite: Suite,
  descriptor: TargetDescriptor,
  options: EvaluatePairOptions = {},
): Promise<{ result: SuiteTargetResult; target: Target | null }> {
  const paths = options.paths ?? suite.paths.map((_, i) => i);
  const limit = options.timeLimitMs ?? DEFAULT_TIME_LIMIT_MS;
  const failed = (reason: string, kind: 'error' | 'cancelled') => ({
    result: sliceFailure(suite, descriptor, paths, options.pathPoints ?? suitePathPoints(suite), reason, kind),
    target: null,
  });
  let target: Target;
  try {
    target = descriptor.open();
  } catch (e) {
    return failed(`the evaluation failed: ${errorText(e)}`, 'error');
  }

  const controller = new AbortController();
  const onCancel = () => controller.abort(options.signal?.reason);
  options.signal?.addEventListener('abort', onCancel, { once: true });
  if (options.signal?.aborted) onCancel();
  let timedOut = false;
  const timer = setTimeout(() => {
    timedOut = true;
    controller.abort(new Error(timeLimitReason(descriptor.name, limit)));
  }, limit);
  const work = evaluateWithProperties(suite, target, paths, controller.signal, options).then(
    (r) => ({ ok: true as const, r }),
    (e: unknown) => ({ ok: false as const, e }),
  );
  const stopped = new Promise<'stopped'>((resolve) =>
    controller.signal.addEventListener('abort', () => resolve('stopped'), { once: true }),
  );
  const first = await Promise.race([work, stopped]);
  clearTimeout(timer);
  options.signal?.removeEventListener('abort', onCancel);

  if (first === 'stopped' || controller.signal.aborted) {
    // Kill what the target holds (a stdio program that does not answer), then let the work wind down for a moment.
    await Promise.race([target.close().catch(() => undefined), unrefDelay(GRACE_MS)]);
    await Promise.race([work, unrefDelay(GRACE_MS)]);
    return timedOut
      ? failed(timeLimitReason(descriptor.name, limit), 'error')
      : failed(errorText(controller.signal.reason ?? 'cancelled'), 'cancelled');
  }
  if (!first.ok) {
    await target.close().catch(() => undefined);
    return failed(`the evaluation failed: ${errorText(first.e)}`, 'error');
  }
  return { result: first.r, target };
}

async function evaluateWithProperties(
  suite: Suite,
  target: Target,
  paths: readonly number[],
  signal: AbortSignal,
  options: EvaluatePairOptions,
): Promise<SuiteTargetResult> {
  const result = await evaluateSuite(suite, target, {
    cache: options.cache,
    signal,
    paths,
    maxFindings: options.maxFindings,
  });
  if (!options.properties || signal.aborted) {
    if (suite.properties.length > 0) result.checked.properties = propertiesNotRun(suite);
    return result;
  }
  const { seed } = options.properties;
  try {
    // `seed` replaces every check's pinned seed, to explore beyond them.
    const checked = seed === null ? suite : { ...suite, properties: suite.properties.map((p) => ({ ...p, seed })) };
    result.properties = await checkSuiteProperties(checked, target, signal);
    result.checked.properties = {
      listed: suite.properties.map((p) => p.law),
      run: true,
      note: `${result.properties.length} property check(s) run`,
    };
  } catch (e) {
    // The values stand; the pair is an error that says the property checks could not run.
    result.errors.push(`property checks: ${errorText(e)}`);
  }
  result.status = pairStatus(result, false);
  return result;
}
