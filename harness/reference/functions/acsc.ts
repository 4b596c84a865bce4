import { asin } from './asin';
import type { ReciprocalFunction } from './reciprocal-function';

/**
 * Principal inverse cosecant acsc z = asin(1/z) (DLMF 4.23.7).
 *
 * - Range: −π/2 ≤ Re ≤ π/2.
 * - Cuts: [−1, 0) and (0, 1] on the real axis; branch points ±1 and 0.
 * - signed-zero: the sign of Im z picks the opposite side of asin's cut, since Im(1/z) = −y/|z|²:
 *   acsc(½ ± 0i) = asin(2 ∓ 0i) = π/2 ∓ 1.3170i.
 * - counter-clockwise: inherited from asin at w = 1/z: [−1, 0) belongs to the lower side,
 *   (0, 1] to the upper side. They differ at x − 0i, 0 < x < 1 and x + 0i, −1 < x < 0.
 */
export const acsc: ReciprocalFunction = {
  name: 'acsc',
  inner: asin,
  cuts: [
    { axis: 'real', from: -1, to: 0 },
    { axis: 'real', from: 0, to: 1 },
  ],
  derivative: { sign: -1, power: 0.5 },
};
