import { atan } from './atan';
import type { ReciprocalFunction } from './reciprocal-function';

/**
 * Principal inverse cotangent acot z = atan(1/z) (DLMF 4.23.9).
 *
 * - Range: −π/2 ≤ Re ≤ π/2 (acot 0 = atan(1/(+0 + 0i)) = π/2).
 * - Cut: the segment [−i, i] of the imaginary axis (0 excluded, where 1/z is infinite); branch points ±i.
 * - signed-zero: Re(1/z) = x/|z|² keeps the sign of Re z, so the sign of Re z picks the side
 *   exactly as for atan: acot(±0 + i/2) = atan(∓2i with Re ±0) = ±π/2 − 0.5493i.
 * - counter-clockwise: inherited from atan at w = 1/z: (0, i] belongs to the left side,
 *   [−i, 0) to the right side. The conventions differ at +0 + iy, 0 < y < 1 and −0 + iy, −1 < y < 0.
 */
export const acot: ReciprocalFunction = {
  name: 'acot',
  inner: atan,
  cuts: [{ axis: 'imaginary', from: -1, to: 1 }],
  derivative: { sign: 1, power: 1 },
};
