import type { Rational } from '../numbers/rational';
import type { ExactPoint, PathSpec } from './continuation-path';
import type { ExactNu } from './cut-layout';
import type { FactoredFunction } from './factored-function';

/**
 * One continuation, typed: every number is exact (rationals, angles in exact turns or radians),
 * so nothing is rounded between the caller and the engine.
 */
export interface ContinuationRequest {
  /** g, already factored into zeros, poles and exp factors. */
  g: FactoredFunction;
  nu: ExactNu;
  z0: ExactPoint;
  /** The branch at z0: its value f0, or the sheet k with f0 = (principal g(z0)^ν)·e^{2πiνk}. */
  start: { kind: 'value'; f0: ExactPoint } | { kind: 'sheet'; k: number };
  path: PathSpec;
  /** Values of the path parameter, each in [0, 1]; the answer keeps their order. */
  at: Rational[];
  /** Cuts, each a polyline (optionally continued to ∞): the values are then those of the branch on the cut plane. */
  cuts: { points: ExactPoint[]; toInfinity: boolean }[] | null;
}
