import { acos } from './acos';
import type { ReciprocalFunction } from './reciprocal-function';

/**
 * Principal inverse secant asec z = acos(1/z) (DLMF 4.23.8).
 *
 * - Range: 0 ≤ Re ≤ π.
 * - Cuts: [−1, 0) and (0, 1] on the real axis (1/z on acos's cuts); branch points ±1 and 0.
 * - signed-zero: Im(1/z) = −y/|z|², so the sign of Im z picks the opposite side of acos's cut:
 *   asec(½ ± 0i) = acos(2 ∓ 0i) = 0 ± 1.3170i.
 * - counter-clockwise: inherited from acos at w = 1/z: [−1, 0) belongs to the lower side,
 *   (0, 1] to the upper side. They differ at x − 0i, 0 < x < 1 and x + 0i, −1 < x < 0.
 */
export const asec: ReciprocalFunction = {
  name: 'asec',
  inner: acos,
  cuts: [
    { axis: 'real', from: -1, to: 0 },
    { axis: 'real', from: 0, to: 1 },
  ],
  derivative: { sign: -1, power: 0.5 },
};
