import { z } from 'zod';
import { textSchema } from './text-schema';
import { complexString, numberString } from './complex-string';
import { entryNameSchema } from './entry-name-schema';
import { objectError } from './object-error';
import { pathGeometryIssues } from './path-geometry-issues';

/** An angle: a number string (radians) or an exact rational multiple of π ("pi", "-pi/2", "3pi/4"). */
export const angleString = z.union(
  [numberString, textSchema().regex(/^\s*[+-]?(\d+(\.\d+)?)?\s*\*?\s*pi(\s*\/\s*\d+)?\s*$/i)],
  {
    error: 'must be a number string (radians) or a multiple of pi such as "3pi/4"',
  },
);

const name = textSchema('is required')
  .min(1, { error: 'is required' })
  .max(80, { error: 'must be at most 80 characters' });
/** The target's entry this path's inputs go in through; absent, the suite's (docs/suite-format.md). */
const entry = entryNameSchema.optional();
const samples = z
  .number({ error: 'must be a whole number' })
  .int({ error: 'must be a whole number' })
  .min(2, { error: 'must be at least 2' })
  .max(100_000, { error: 'must be at most 100000' });
const at = z
  .array(numberString)
  .min(1, { error: 'needs at least one t' })
  .max(10_000, { error: 'must have at most 10000 values' });

/**
 * Where to sample a path: `samples` evenly spaced values of t, or the explicit values `at`.
 * Checked by the refinement below, since either may be absent in the JSON.
 */
const sampling = { samples: samples.optional(), at: at.optional() };
const oneSampling = (p: { samples?: number; at?: string[] }) => (p.samples === undefined) !== (p.at === undefined);
const ONE_SAMPLING = { error: 'give exactly one of samples and at', path: ['samples'] };

const circle = z
  .strictObject(
    {
      kind: z.literal('circle'),
      name,
      entry,
      center: complexString,
      radius: numberString,
      start_angle: angleString.default('0'),
      turns: numberString.default('1'),
      direction: z.enum(['ccw', 'cw'], { error: 'must be ccw or cw' }).default('ccw'),
      ...sampling,
    },
    { error: objectError },
  )
  .refine(oneSampling, ONE_SAMPLING);

const segment = z
  .strictObject(
    { kind: z.literal('segment'), name, entry, from: complexString, to: complexString, ...sampling },
    { error: objectError },
  )
  .refine(oneSampling, ONE_SAMPLING);

const polyline = z
  .strictObject(
    {
      kind: z.literal('polyline'),
      name,
      entry,
      points: z
        .array(complexString)
        .min(2, { error: 'needs at least two points' })
        .max(200, { error: 'must have at most 200 points' }),
      ...sampling,
    },
    { error: objectError },
  )
  .refine(oneSampling, ONE_SAMPLING);

const straddle = z.strictObject(
  {
    kind: z.literal('straddle'),
    name,
    entry,
    /** The cut to straddle: a segment, or a ray from `from` through `through` and beyond. */
    cut: z.discriminatedUnion(
      'kind',
      [
        z.strictObject({ kind: z.literal('segment'), from: complexString, to: complexString }, { error: objectError }),
        z.strictObject({ kind: z.literal('ray'), from: complexString, through: complexString }, { error: objectError }),
      ],
      { error: 'must be a segment {from, to} or a ray {from, through}' },
    ),
    /** Along a segment: fractions of its length in [0, 1]; along a ray: distances from its start. */
    along: z
      .array(numberString)
      .min(1, { error: 'needs at least one place' })
      .max(1000, { error: 'must have at most 1000 places' }),
    /** Distances from the cut, each used on both sides; the points exactly on it come with +0 and −0. */
    offsets: z
      .array(numberString)
      .min(1, { error: 'needs at least one offset' })
      .max(32, { error: 'must have at most 32 offsets' })
      .default(['1e-3', '1e-9', '1e-300', '5e-324']),
  },
  { error: objectError },
);

/**
 * Exactly these points, each evaluated once, in the order written: a list, not a path, so no
 * continuity check (jumps, misplaced cuts, monodromy) applies to it. 1000 points is far more than
 * a hand-written list needs; a sweep is a segment, polyline or grid.
 */
const points = z.strictObject(
  {
    kind: z.literal('points'),
    name,
    entry,
    points: z
      .array(complexString)
      .min(1, { error: 'needs at least one point' })
      .max(1000, { error: 'must have at most 1000 points' }),
  },
  { error: objectError },
);

const gridCount = z
  .number({ error: 'must be a whole number' })
  .int({ error: 'must be a whole number' })
  .min(2, { error: 'must be at least 2' })
  .max(2000, { error: 'must be at most 2000' });

const grid = z.strictObject(
  {
    kind: z.literal('grid'),
    name,
    entry,
    min: complexString,
    max: complexString,
    columns: gridCount,
    rows: gridCount,
    both_zero_signs: z.boolean().default(true),
  },
  { error: objectError },
);

/** One path of a suite, docs/vocabulary.md. Numbers are strings (docs/suite-format.md); t runs over [0, 1]. */
export const suitePathSchema = z
  .discriminatedUnion('kind', [circle, segment, polyline, straddle, points, grid], {
    error: 'kind must be circle, segment, polyline, straddle, points or grid',
  })
  // A path that would check nothing (a radius of -1, a cut of no length) is refused here, beside its field.
  .superRefine((path, ctx) => {
    for (const issue of pathGeometryIssues(path)) ctx.addIssue({ code: 'custom', ...issue });
  });

export type SuitePath = z.infer<typeof suitePathSchema>;
/** A path as written in a file or a form, before defaults are filled in. */
export type SuitePathInput = z.input<typeof suitePathSchema>;
