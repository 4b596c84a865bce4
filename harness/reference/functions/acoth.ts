import { atanh } from './atanh';
import type { ReciprocalFunction } from './reciprocal-function';

/**
 * Principal inverse hyperbolic cotangent acoth z = atanh(1/z) (DLMF 4.37.9).
 *
 * - Range: |Im| ≤ π/2.
 * - Cut: [−1, 1] on the real axis (0 excluded); branch points ±1 (logarithmic poles).
 * - signed-zero: the sign of Im z picks the opposite side of atanh's cut, since Im(1/z) = −y/|z|²:
 *   acoth(½ ± 0i) = atanh(2 ∓ 0i) = 0.5493 ∓ iπ/2.
 * - counter-clockwise: inherited from atanh at w = 1/z: [−1, 0) belongs to the lower side,
 *   (0, 1] to the upper side. They differ at x − 0i, 0 < x < 1 and x + 0i, −1 < x < 0.
 */
export const acoth: ReciprocalFunction = {
  name: 'acoth',
  inner: atanh,
  cuts: [
    { axis: 'real', from: -1, to: 0 },
    { axis: 'real', from: 0, to: 1 },
  ],
  derivative: { sign: -1, power: 1 },
};
