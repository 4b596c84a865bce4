import type { Target } from '../adapters/target';
import { evaluatePair } from './evaluate-pair';
import type { ReferenceCache } from './reference-cache';
import type { ShardLane } from './shard-lane';
import { unrefDelay } from './unref-delay';

/** How long closing a target at the end of a run may take before it is left behind. */
const CLOSE_MS = 2_000;

/**
 * Shards evaluated one after another in this process. Each target of the plan is opened once and
 * kept for its later shards, until an evaluation stops or fails: evaluatePair has then closed it,
 * and the next shard opens a fresh one.
 */
export function inProcessLane(cache: ReferenceCache): ShardLane {
  const open = new Map<number, Target>();
  return {
    async run({ shard, suite, ref, pathPoints, evaluation }, signal) {
      const { result, target } = await evaluatePair(
        suite,
        { ...ref, open: () => open.get(shard.target) ?? ref.open() },
        { ...evaluation, cache, signal, paths: shard.paths, pathPoints },
      );
      if (target) open.set(shard.target, target);
      else open.delete(shard.target);
      return result;
    },
    async close() {
      const all = [...open.values()];
      open.clear();
      await Promise.all(all.map((t) => Promise.race([t.close(), unrefDelay(CLOSE_MS)]).catch(() => undefined)));
    },
  };
}
