import { BigComplex } from './big-complex';
import type { SpecialValue } from './special-value';

/**
 * Applies a special-value table written for the upper half-plane (and, for odd
 * functions, the right half) to any z, using conjugate symmetry f(conj z) = conj f(z)
 * and oddness f(−z) = −f(z), the way ISO/IEC 9899:2011 G.6 states its tables.
 * NaN parts carry no sign and are never reflected.
 */
export function withSymmetry(
  z: BigComplex,
  odd: boolean,
  table: (z: BigComplex) => SpecialValue | null,
): SpecialValue | null {
  const flipX = odd && !z.re.isNaN() && z.re.signbit();
  const flipY = !z.im.isNaN() && z.im.signbit() !== flipX;
  let w = z;
  if (flipX) w = w.negate();
  if (!w.im.isNaN() && w.im.signbit()) w = w.conj();
  let v = table(w);
  if (v === null) return null;
  if (flipY) v = v.conj();
  if (flipX) v = v.negate();
  return v;
}
