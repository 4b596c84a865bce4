import { z } from 'zod';
import { queryObject } from './query-object';
import { textSchema } from './text-schema';

const name = textSchema()
  .trim()
  .min(1, { error: 'must not be empty' })
  .max(120, { error: 'must be at most 120 characters' });

/**
 * Filters of the Decisions list (GET /api/deviations): `library` is a library without its version
 * ("complex.js", "mathjs/number"), `suite` a suite's slug, `id` one decision (the case page links to it).
 */
export const decisionListQuery = queryObject({
  library: name.optional(),
  suite: name.optional(),
  id: z.uuid({ error: 'must be a decision id' }).optional(),
});

export type DecisionListQuery = z.infer<typeof decisionListQuery>;
