import { acosh } from './acosh';
import type { ReciprocalFunction } from './reciprocal-function';

/**
 * Principal inverse hyperbolic secant asech z = acosh(1/z) (DLMF 4.37.8).
 *
 * - Range: Re ≥ 0, −π ≤ Im ≤ π.
 * - Cuts: (−∞, 0) and [1, ∞) on the real axis (1/z on acosh's cut (−∞, 1]); branch points 0, ±1.
 * - signed-zero: the sign of Im z picks the opposite side of acosh's cut:
 *   asech(2 ± 0i) = acosh(½ ∓ 0i) = 0 ∓ 1.0472i.
 * - counter-clockwise: inherited from acosh at w = 1/z: both pieces belong to the lower side.
 *   The conventions differ at x + 0i for x < 0 or x > 1.
 */
export const asech: ReciprocalFunction = {
  name: 'asech',
  inner: acosh,
  cuts: [
    { axis: 'real', from: -Infinity, to: 0 },
    { axis: 'real', from: 1, to: Infinity },
  ],
  derivative: { sign: -1, power: 0.5 },
};
