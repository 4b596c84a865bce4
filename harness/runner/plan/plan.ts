import type { Suite } from '../../../shared/schemas/suite-schema';
import type { TargetDescriptor } from '../../adapters/target-descriptor';

/** A unit of work a worker takes from the queue: some paths of one suite against one target. */
export interface Slice {
  id: number;
  suite: number;
  target: number;
  /** Indices into the suite's paths, in order. */
  paths: number[];
  points: number;
}

/** Suites × targets, split into slices (docs/vocabulary.md). `pathPoints[s][p]` is the size of path p of suite s. */
export interface Plan {
  suites: Suite[];
  targets: TargetDescriptor[];
  pathPoints: number[][];
  slices: Slice[];
}
