import type { ComplexPair } from './complex-pair';

/**
 * The inputs every entry point is tried with: the four signed zeros, and one point
 * on each principal cut axis where the zero part picks the side (−4 ∓ 0i for
 * sqrt/log, −0 + 2i for the cuts on the imaginary axis).
 */
export const PROBE_INPUTS: readonly ComplexPair[] = [
  [0, 0],
  [0, -0],
  [-0, 0],
  [-0, -0],
  [-4, -0],
  [-0, 2],
];
