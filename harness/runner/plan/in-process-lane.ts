import type { Target } from '../../adapters/target';
import { evaluatePair } from '../evaluation/evaluate-pair';
import { unrefDelay } from '../evaluation/unref-delay';
import type { ReferenceCache } from '../reference-cache/reference-cache';
import type { SliceLane } from './slice-lane';

/** How long closing a target at the end of a run may take before it is left behind. */
const CLOSE_MS = 2_000;

/**
 * Slices evaluated one after another in this process. Each target of the plan is opened once and
 * kept for its later slices, until an evaluation stops or fails: evaluatePair has then closed it,
 * and the next slice opens a fresh one.
 */
export function inProcessLane(cache: ReferenceCache): SliceLane {
  const open = new Map<number, Target>();
  return {
    async run({ slice, suite, descriptor, pathPoints, evaluation }, signal) {
      const { result, target } = await evaluatePair(
        suite,
        { ...descriptor, open: () => open.get(slice.target) ?? descriptor.open() },
        { ...evaluation, cache, signal, paths: slice.paths, pathPoints },
      );
      if (target) open.set(slice.target, target);
      else open.delete(slice.target);
      return result;
    },
    async close() {
      const all = [...open.values()];
      open.clear();
      await Promise.all(all.map((t) => Promise.race([t.close(), unrefDelay(CLOSE_MS)]).catch(() => undefined)));
    },
  };
}
