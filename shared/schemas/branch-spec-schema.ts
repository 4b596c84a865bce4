import { z } from 'zod';
import { textSchema } from './text-schema';
import { complexString, numberString } from './complex-string';
import { objectError } from './object-error';

const cut = z.strictObject(
  {
    points: z.array(complexString).min(2, { error: 'needs at least two points' }).max(200),
    /** Continue the last segment's direction to ∞. */
    to_infinity: z.boolean().default(false),
  },
  { error: objectError },
);

const principal = z.strictObject({ kind: z.literal('principal') }, { error: objectError });

const regular = z
  .strictObject(
    {
      kind: z.literal('regular'),
      /** g(z), a rational function of z (optionally with exp factors) written like a subject. */
      g: textSchema('is required').min(1, { error: 'is required' }).max(400),
      nu: z.union([numberString, complexString], { error: 'must be a number string or {"re","im"}' }),
      z0: complexString,
      /** The value at z0, or… */
      f0: complexString.optional(),
      /** …the k-th value principal·e^{2πiνk} at z0. */
      k: z.number().int({ error: 'must be a whole number' }).min(-1000).max(1000).optional(),
      cuts: z.array(cut).max(50),
    },
    { error: objectError },
  )
  .refine((b) => (b.f0 === undefined) !== (b.k === undefined), { error: 'give exactly one of f0 and k', path: ['f0'] });

/**
 * What the subject should equal (docs/vocabulary.md): the principal branch of every function in it,
 * or a regular branch of g(z)^ν fixed at z0 with its cut layout.
 */
export const branchSpecSchema = z.discriminatedUnion('kind', [principal, regular], {
  error: 'kind must be principal or regular',
});

export type BranchSpec = z.infer<typeof branchSpecSchema>;
