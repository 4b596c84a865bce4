import type { Cut } from './cut';

/**
 * The cut of every power and root with a non-integer exponent (pow, cbrt, nthroot): (−∞, 0],
 * closed from above under Kahan's rule (DLMF 4.2.26 with 4.2.2).
 */
export const POWER_CUTS: readonly Cut[] = [{ axis: 'real', from: -Infinity, to: 0, ccwSide: 'upper' }];
