import { Rational } from '../numbers/rational';

/**
 * Principal cube root cbrt z = z^(1/3) = exp(⅓ Log z) (DLMF 4.2.26 with the exact exponent 1/3),
 * evaluated by {@link pow}. Not C's real cbrt: cbrt(−8) is 1 + √3·i, not −2.
 *
 * - Range: −π/3 < arg ≤ π/3 (counter-clockwise), −π/3 ≤ arg ≤ π/3 (signed-zero).
 * - Cut: (−∞, 0]; branch point 0.
 * - signed-zero: the sign of Im z picks the side, cbrt(−8 ± 0i) = 1 ± √3·i; conjugate symmetric.
 * - counter-clockwise: the cut belongs to the upper side, cbrt(−8) = 1 + √3·i. They differ at x − 0i, x < 0.
 */
export const CBRT_EXPONENT = new Rational(1n, 3n);
