import { asinh } from './asinh';
import type { ReciprocalFunction } from './reciprocal-function';

/**
 * Principal inverse hyperbolic cosecant acsch z = asinh(1/z) (DLMF 4.37.7).
 *
 * - Range: |Im| ≤ π/2.
 * - Cut: the segment [−i, i] of the imaginary axis (0 excluded); branch points ±i.
 * - signed-zero: Re(1/z) keeps the sign of Re z, so the sign of Re z picks the side as for asinh:
 *   acsch(±0 + i/2) = asinh(±0 − 2i) = ±1.3170 − iπ/2.
 * - counter-clockwise: inherited from asinh at w = 1/z: [−i, 0) belongs to the right side,
 *   (0, i] to the left side. They differ at −0 + iy, −1 < y < 0 and +0 + iy, 0 < y < 1.
 */
export const acsch: ReciprocalFunction = {
  name: 'acsch',
  inner: asinh,
  cuts: [{ axis: 'imaginary', from: -1, to: 1 }],
  derivative: { sign: 1, power: 0.5 },
};
