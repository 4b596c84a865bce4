import { z } from 'zod';
import { textSchema } from './text-schema';
import { branchSpecSchema } from './branch-spec-schema';
import { conventionSchema } from './convention-schema';
import { counterpartSchema } from './counterpart-schema';
import { entryNameSchema } from './entry-name-schema';
import { objectError } from './object-error';
import { propertyCheckSchema } from './property-check-schema';
import { suitePathSchema } from './suite-path-schema';
import { toleranceSchema } from './tolerance-schema';

/**
 * A suite (docs/vocabulary.md): a subject, what it should equal, the convention on the cuts, the
 * paths to evaluate it along, tolerances per check, property checks and counterparts (other ways
 * to compute the subject that must agree with it). Results always name
 * the suite's id and version. The same schema validates suite files, the suite form and the API.
 */
export const suiteSchema = z
  .strictObject(
    {
      id: textSchema('is required')
        .regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, { error: 'must be lower-case words joined by hyphens' })
        .max(80, { error: 'must be at most 80 characters' }),
      version: z
        .number({ error: 'must be a whole number' })
        .int({ error: 'must be a whole number' })
        .min(1, { error: 'must be at least 1' }),
      title: textSchema('is required')
        .min(3, { error: 'must be at least 3 characters' })
        .max(120, { error: 'must be at most 120 characters' }),
      /** Why the suite exists: what a maintainer would break, and what the values pin down. */
      story: textSchema().max(4000, { error: 'must be at most 4000 characters' }).default(''),
      subject: textSchema('is required')
        .min(1, { error: 'is required' })
        .max(400, { error: 'must be at most 400 characters' }),
      /**
       * How the inputs get into the library: one of the target's entries (`sheetkeeper targets`);
       * absent, the library's documented constructor from two numbers. A path may name its own.
       */
      entry: entryNameSchema.optional(),
      branch: branchSpecSchema,
      convention: conventionSchema,
      paths: z
        .array(suitePathSchema)
        .min(1, { error: 'needs at least one path' })
        .max(50, { error: 'must have at most 50 paths' }),
      tolerances: z.strictObject(
        {
          values: toleranceSchema,
          monodromy: toleranceSchema.optional(),
          properties: toleranceSchema.optional(),
        },
        { error: objectError },
      ),
      properties: z.array(propertyCheckSchema).max(20, { error: 'must have at most 20 property checks' }).default([]),
      /** Other ways to compute the subject that must agree with it at every point (counterpart-schema.ts). */
      counterparts: z.array(counterpartSchema).max(4, { error: 'must have at most 4 counterparts' }).default([]),
    },
    { error: objectError },
  )
  .superRefine((suite, ctx) => {
    // Path names identify results ("the straddle at -2 failed"), so they must be unique.
    const seen = new Set<string>();
    suite.paths.forEach((path, i) => {
      if (seen.has(path.name))
        ctx.addIssue({ code: 'custom', message: `repeats the path name "${path.name}"`, path: ['paths', i, 'name'] });
      seen.add(path.name);
    });
  });

export type Suite = z.infer<typeof suiteSchema>;
/** A suite as written in a file or a form, before defaults are filled in. */
export type SuiteInput = z.input<typeof suiteSchema>;
