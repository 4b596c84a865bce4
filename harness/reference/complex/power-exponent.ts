import type { Rational } from '../numbers/rational';
import type { BigComplex } from './big-complex';

/**
 * The exponent w of z^w: an exact rational ("1/3", or a double's exact value) or a
 * complex number given as two doubles.
 */
export type PowerExponent = { kind: 'rational'; value: Rational } | { kind: 'complex'; value: BigComplex };
