import { z } from 'zod';
import { complexString, numberString } from './complex-string';
import { objectError } from './object-error';
import { regionGeometryIssues } from './region-geometry-issues';

/**
 * The laws a property check can state. Each is a published identity or range condition
 * of the principal branches (DLMF chapter 4) or of roots:
 * - `conjugate-symmetry`: f(z̄) = conj f(z) off the cuts;
 * - `odd-symmetry` / `even-symmetry`: f(−z) = −f(z) / f(z);
 * - `root-power`: f(z)^power = g(z) for a root f of g;
 * - `exp-log`: exp(log z) = z;
 * - `range`: the value lies in the principal range of the outermost function;
 * - `unwinding`: log(z1·z2) = log z1 + log z2 − 2πi·K(log z1 + log z2), K the unwinding number.
 */
export const PROPERTY_LAWS = [
  'conjugate-symmetry',
  'odd-symmetry',
  'even-symmetry',
  'root-power',
  'exp-log',
  'range',
  'unwinding',
] as const;

const region = z
  .discriminatedUnion(
    'kind',
    [
      z.strictObject({ kind: z.literal('disc'), center: complexString, radius: numberString }, { error: objectError }),
      z.strictObject({ kind: z.literal('box'), min: complexString, max: complexString }, { error: objectError }),
      /** Points within `distance` of the subject's expected cuts, on both sides. */
      z.strictObject({ kind: z.literal('near-cuts'), distance: numberString }, { error: objectError }),
    ],
    { error: 'kind must be disc, box or near-cuts' },
  )
  // A region that holds no point (a disc of radius 0) would check no law: refused beside its field.
  .superRefine((r, ctx) => {
    for (const issue of regionGeometryIssues(r)) ctx.addIssue({ code: 'custom', ...issue });
  });

export const propertyCheckSchema = z
  .strictObject(
    {
      law: z.enum(PROPERTY_LAWS, { error: `must be one of ${PROPERTY_LAWS.join(', ')}` }),
      region,
      /** For `root-power`: the power n with f(z)^n = g(z). */
      power: z.number().int().min(2).max(64).optional(),
      runs: z.number().int().min(1).max(100_000).default(200),
      /** fast-check seed; pinned so a failure can be replayed, and printed with it. */
      seed: z.number().int({ error: 'must be a whole number' }),
    },
    { error: objectError },
  )
  .refine((p) => (p.law === 'root-power') === (p.power !== undefined), {
    error: 'power goes with root-power, and only with it',
    path: ['power'],
  });

export type PropertyCheck = z.infer<typeof propertyCheckSchema>;
