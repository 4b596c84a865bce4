import type { Suite } from '../../../shared/schemas/suite-schema';
import type { TargetDescriptor } from '../../adapters/target-descriptor';
import type { Plan, Slice } from './plan';
import { suitePathPoints } from './suite-path-points';

/**
 * Points per slice: a slice of 20,000 points takes ~0.1 s against complex.js with cached
 * references and a few seconds cold (bench:harness), short enough for a time limit to mean
 * something and for cancellation to land quickly, long enough that scheduling costs nothing.
 */
export const DEFAULT_SLICE_POINTS = 20_000;

/**
 * Splits suites × targets into slices: for each pair, consecutive paths are grouped while the
 * slice stays within `slicePoints` points; a larger path is a slice of its own (a path is never
 * split, since jumps and monodromy are read along the whole of it). A path that cannot be built
 * counts as 0 points here; evaluating it reports why.
 */
export function buildPlan(suites: Suite[], targets: TargetDescriptor[], slicePoints = DEFAULT_SLICE_POINTS): Plan {
  const pathPoints = suites.map(suitePathPoints);
  const slices: Slice[] = [];
  suites.forEach((suite, s) => {
    targets.forEach((_, t) => {
      let current: Slice | null = null;
      suite.paths.forEach((_, p) => {
        const n = pathPoints[s]?.[p] ?? 0;
        if (!current || (current.points + n > slicePoints && current.paths.length > 0)) {
          current = { id: slices.length, suite: s, target: t, paths: [], points: 0 };
          slices.push(current);
        }
        current.paths.push(p);
        current.points += n;
      });
    });
  });
  return { suites, targets, pathPoints, slices };
}
