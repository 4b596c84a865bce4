import { Rational } from '../numbers/rational';

/**
 * Principal n-th root nthroot(z, n) = z^(1/n) = exp(Log z / n) (DLMF 4.2.26), n a non-zero
 * integer, evaluated by {@link pow} with the exact exponent 1/n.
 *
 * - Range: −π/|n| < arg ≤ π/|n| (counter-clockwise), closed at both ends under signed-zero.
 * - Cut: (−∞, 0] for |n| ≥ 2 (none for n = ±1); branch point 0.
 * - signed-zero: the sign of Im z picks the side, nthroot(−16 ± 0i, 4) = √2 ± √2·i.
 * - counter-clockwise: the cut belongs to the upper side. They differ at x − 0i, x < 0.
 *
 * Throws a RangeError for n missing, not an integer, or 0.
 */
export function nthrootExponent(n: number | undefined): Rational {
  if (n === undefined || !Number.isInteger(n) || n === 0) throw new RangeError('nthroot needs a non-zero integer "n"');
  return new Rational(1n, BigInt(n));
}
