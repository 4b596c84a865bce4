import { z } from 'zod';
import { textSchema } from './text-schema';
import { complexString, numberString } from './complex-string';
import { objectError } from './object-error';
import { angleString } from './suite-path-schema';

const circlePath = z.strictObject(
  {
    kind: z.literal('circle'),
    center: complexString,
    radius: numberString,
    // As in a suite's circle: radians, or an exact multiple of π ("pi/2"); turns as a number or a
    // number string ("1/3" is exactly a third of a turn), read exactly as written.
    start_angle: angleString.default('0'),
    turns: z
      .union([z.number({ error: 'must be a number' }), numberString], {
        error: 'must be a number or a number string such as "1/3"',
      })
      .default(1),
    direction: z.enum(['ccw', 'cw'], { error: 'must be ccw or cw' }).default('ccw'),
  },
  { error: objectError },
);

const polylinePath = z.strictObject(
  {
    kind: z.literal('polyline'),
    points: z.array(complexString).min(2, { error: 'needs at least two points' }).max(200),
  },
  { error: objectError },
);

/** One request line of `sheetkeeper continue` (docs/suite-format.md), plus an optional cut layout. */
export const continueRequest = z
  .strictObject(
    {
      g: textSchema('is required').max(400),
      nu: z.union([numberString, complexString], { error: 'must be a number string or {"re","im"}' }),
      z0: complexString,
      f0: complexString.optional(),
      k: z.number().int({ error: 'must be an integer' }).optional(),
      path: z.discriminatedUnion('kind', [circlePath, polylinePath], { error: 'must be a circle or a polyline' }),
      at: z.array(numberString).min(1, { error: 'needs at least one t' }).max(1000),
      cuts: z
        .array(
          z.strictObject(
            { points: z.array(complexString).min(2).max(200), to_infinity: z.boolean().default(false) },
            { error: objectError },
          ),
        )
        .max(50)
        .optional(),
    },
    { error: objectError },
  )
  .refine((r) => (r.f0 === undefined) !== (r.k === undefined), { error: 'give exactly one of f0 and k' });

export type ContinueRequest = z.infer<typeof continueRequest>;
