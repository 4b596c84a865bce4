import type { Rational } from '../numbers/rational';

/**
 * An angle held exactly: a rational number of turns (a suite's "pi/2" is exactly 1/4 turn, so
 * the engine computes its sine and cosine from π itself, never from a rounded double), or a
 * rational number of radians, as the `continue` command's `start_angle` is written.
 */
export type ExactAngle = { kind: 'turns'; turns: Rational } | { kind: 'radians'; radians: Rational };
