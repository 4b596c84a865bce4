import { z } from 'zod';

/**
 * How values on a branch cut are chosen: `signed-zero` (IEC 60559 / ISO C Annex G, the sign
 * of a zero part picks the side) or `counter-clockwise` (Kahan 1987, zero signs ignored, the
 * cut continuous with the side met turning counter-clockwise about its finite end).
 */
export const conventionSchema = z.enum(['signed-zero', 'counter-clockwise'], {
  error: 'must be signed-zero or counter-clockwise',
});

export type Convention = z.infer<typeof conventionSchema>;
