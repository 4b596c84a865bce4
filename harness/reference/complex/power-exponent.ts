import type { Rational } from '../numbers/rational';
import type { BigComplex } from './big-complex';

/**
 * The exponent w of z^w: an exact rational ("1/3", or a double's exact value), a complex number
 * with binary-fraction parts (two doubles, or ratios p/q whose q is a power of two), or a complex
 * number with exact rational parts ({"re": "1/3", "im": "1"}), at least one of them not a binary
 * fraction. A request never rounds a p/q: docs/suite-format.md, "The reference request".
 */
export type PowerExponent =
  | { kind: 'rational'; value: Rational }
  | { kind: 'complex'; value: BigComplex }
  | { kind: 'gaussian'; re: Rational; im: Rational };
